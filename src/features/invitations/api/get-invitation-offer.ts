import { queryOptions, useQuery } from '@tanstack/react-query';
import type { InvitationPublicView } from '@shared/schemas/mail';
import { api } from '@/lib/api-client';
import { invitationKeys } from './invitation-keys';

export const getInvitationOffer = (token: string, signal?: AbortSignal) =>
  api<InvitationPublicView>(`/invitations/${encodeURIComponent(token)}`, { signal, quiet401: true });

/** What an invitation link offers; a used, revoked or expired link is an answer, not a retry. */
export const invitationOfferQueryOptions = (token: string) =>
  queryOptions({ queryKey: invitationKeys.offer(token), queryFn: ({ signal }) => getInvitationOffer(token, signal), retry: false, staleTime: 0 });

export const useInvitationOffer = (token: string) => useQuery(invitationOfferQueryOptions(token));
