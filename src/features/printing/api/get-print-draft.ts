import { queryOptions, useQuery } from '@tanstack/react-query';
import type { DraftDto } from '@shared/schemas/draft-dto';
import { api } from '@/lib/api-client';
import { printKeys } from './print-keys';

/** GET /api/drafts/:id: the draft to print, when the screen (the work queue) has only its id. */
export const getPrintDraft = (id: number, signal?: AbortSignal) => api<DraftDto>(`/drafts/${id}`, { signal });

/** Read afresh each time the dialog opens, so the pages match the draft as it is now. */
export const printDraftQueryOptions = (id: number) =>
  queryOptions({ queryKey: printKeys.draft(id), queryFn: ({ signal }) => getPrintDraft(id, signal), staleTime: 0 });

/** The draft for the print dialog, fetched only when `enabled` (the workspace passes its own copy instead). */
export const usePrintDraft = (id: number, enabled: boolean) => useQuery({ ...printDraftQueryOptions(id), enabled });
