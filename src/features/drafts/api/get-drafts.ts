import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { DraftSummaryDto } from '@shared/schemas/draft-dto';
import { api } from '@/lib/api-client';
import { draftKeys, type DraftListFilters } from './draft-keys';

export interface DraftPage {
  items: DraftSummaryDto[];
  total: number;
  page: number;
  pageSize: number;
}

function query(filters: DraftListFilters): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(filters)) if (value !== undefined && value !== '') params.set(key, String(value));
  const text = params.toString();
  return text ? `?${text}` : '';
}

/** GET /api/drafts: the studio's drafts, filtered and paged. */
export const getDrafts = (filters: DraftListFilters, signal?: AbortSignal) => api<DraftPage>(`/drafts${query(filters)}`, { signal });

export const draftsQueryOptions = (filters: DraftListFilters) =>
  queryOptions({ queryKey: draftKeys.list(filters), queryFn: ({ signal }) => getDrafts(filters, signal), placeholderData: keepPreviousData });

export const useDrafts = (filters: DraftListFilters) => useQuery(draftsQueryOptions(filters));
