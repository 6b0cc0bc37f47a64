import { queryOptions, useQuery } from '@tanstack/react-query';
import type { InvitationsResponse } from '@shared/schemas/mail';
import { api } from '@/lib/api-client';
import { invitationKeys } from './invitation-keys';

export const getInvitations = (signal?: AbortSignal) => api<InvitationsResponse>('/studio/invitations', { signal });

export const invitationsQueryOptions = () =>
  queryOptions({ queryKey: invitationKeys.list(), queryFn: ({ signal }) => getInvitations(signal), select: (data) => data.invitations });

/** The studio's invitations, newest first (owners only). */
export const useInvitations = () => useQuery(invitationsQueryOptions());
