import { queryOptions, useQuery } from '@tanstack/react-query';
import type { DraftDto } from '@shared/schemas/draft-dto';
import { api } from '@/lib/api-client';
import { draftKeys } from './draft-keys';

/** GET /api/drafts/:id: the draft with its newest revision, what the caller may do, and the engine check. */
export const getDraft = (id: number, signal?: AbortSignal) => api<DraftDto>(`/drafts/${id}`, { signal });

export const draftQueryOptions = (id: number) =>
  queryOptions({ queryKey: draftKeys.detail(id), queryFn: ({ signal }) => getDraft(id, signal), staleTime: 10_000 });

export const useDraft = (id: number) => useQuery(draftQueryOptions(id));
