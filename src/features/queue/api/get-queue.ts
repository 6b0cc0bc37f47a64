import { queryOptions, useQuery } from '@tanstack/react-query';
import type { QueueItemDto } from '@shared/schemas/draft-dto';
import { api } from '@/lib/api-client';
import { queueKeys, type QueueState } from './queue-keys';

/** GET /api/queue?state=: drafts waiting in a state, oldest first (approved = waiting to be cut). */
export const getQueue = (state: QueueState, signal?: AbortSignal) => api<{ items: QueueItemDto[] }>(`/queue?state=${state}`, { signal });

export const queueQueryOptions = (state: QueueState) =>
  queryOptions({ queryKey: queueKeys.list(state), queryFn: ({ signal }) => getQueue(state, signal), select: (data) => data.items, staleTime: 10_000 });

export const useQueue = (state: QueueState) => useQuery(queueQueryOptions(state));
