import { queryOptions, useQuery } from '@tanstack/react-query';
import type { MembersResponse } from '@shared/schemas/auth';
import { api } from '@/lib/api-client';
import { studioKeys } from './studio-keys';

export const getMembers = (signal?: AbortSignal) => api<MembersResponse>('/studio/members', { signal });

export const membersQueryOptions = () =>
  queryOptions({ queryKey: studioKeys.members(), queryFn: ({ signal }) => getMembers(signal), select: (data) => data.members });

/** The studio's members, owners first as the server sends them (owners only). */
export const useMembers = () => useQuery(membersQueryOptions());
