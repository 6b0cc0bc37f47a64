import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ClientView } from '@shared/schemas/client';
import { api } from '@/lib/api-client';
import { clientKeys } from './client-keys';

export const getClient = (id: number, signal?: AbortSignal) => api<ClientView>(`/clients/${id}`, { signal });

export const clientQueryOptions = (id: number) =>
  queryOptions({ queryKey: clientKeys.detail(id), queryFn: ({ signal }) => getClient(id, signal) });

export const useClient = (id: number) => useQuery(clientQueryOptions(id));
