import { queryOptions, useQuery } from '@tanstack/react-query';
import type { DeliveriesResponse } from '@shared/schemas/mail';
import { api } from '@/lib/api-client';
import { mailKeys } from './mail-keys';

export const getClientDeliveries = (clientId: number, signal?: AbortSignal) =>
  api<DeliveriesResponse>(`/clients/${clientId}/deliveries`, { signal });

export const clientDeliveriesQueryOptions = (clientId: number) =>
  queryOptions({
    queryKey: mailKeys.clientDeliveries(clientId),
    queryFn: ({ signal }) => getClientDeliveries(clientId, signal),
    select: (data) => data.deliveries,
  });

/** What was e-mailed about a client (owners only), newest first. */
export const useClientDeliveries = (clientId: number, enabled = true) => useQuery({ ...clientDeliveriesQueryOptions(clientId), enabled });
