import { queryOptions, useQuery } from '@tanstack/react-query';
import type { DeliveriesResponse } from '@shared/schemas/mail';
import { api } from '@/lib/api-client';
import { mailKeys } from './mail-keys';

export const getDraftDeliveries = (draftId: number, signal?: AbortSignal) =>
  api<DeliveriesResponse>(`/drafts/${draftId}/deliveries`, { signal });

export const draftDeliveriesQueryOptions = (draftId: number) =>
  queryOptions({
    queryKey: mailKeys.draftDeliveries(draftId),
    queryFn: ({ signal }) => getDraftDeliveries(draftId, signal),
    select: (data) => data.deliveries,
  });

/** What was e-mailed from a draft (owners only), newest first. */
export const useDraftDeliveries = (draftId: number, enabled = true) => useQuery({ ...draftDeliveriesQueryOptions(draftId), enabled });
