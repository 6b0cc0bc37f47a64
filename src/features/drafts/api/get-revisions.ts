import { queryOptions, useQuery } from '@tanstack/react-query';
import type { RevisionDto, RevisionSummaryDto } from '@shared/schemas/draft-dto';
import { api } from '@/lib/api-client';
import { draftKeys } from './draft-keys';

/** GET /api/drafts/:id/revisions: every revision, newest first. */
export const getRevisions = (id: number, signal?: AbortSignal) => api<{ items: RevisionSummaryDto[] }>(`/drafts/${id}/revisions`, { signal });

/** GET /api/drafts/:id/revisions/:rev: one revision in full, to view it. */
export const getRevision = (id: number, rev: number, signal?: AbortSignal) => api<RevisionDto>(`/drafts/${id}/revisions/${rev}`, { signal });

export const revisionsQueryOptions = (id: number) =>
  queryOptions({ queryKey: draftKeys.revisions(id), queryFn: ({ signal }) => getRevisions(id, signal), select: (data) => data.items });

export const revisionQueryOptions = (id: number, rev: number) =>
  queryOptions({ queryKey: draftKeys.revision(id, rev), queryFn: ({ signal }) => getRevision(id, rev, signal), staleTime: Infinity });

export const useRevisions = (id: number, enabled = true) => useQuery({ ...revisionsQueryOptions(id), enabled });

export const useRevision = (id: number, rev: number | null) => useQuery({ ...revisionQueryOptions(id, rev ?? 0), enabled: rev !== null });
