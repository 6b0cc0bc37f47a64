import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { ClientListQueryInput, ClientPage } from '@shared/schemas/client';
import { api } from '@/lib/api-client';
import { clientKeys } from './client-keys';

/** The query string of a client list, leaving out what is empty. */
export function clientListSearch(query: ClientListQueryInput): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) {
    if (value === undefined || value === null || value === '') continue;
    params.set(key, String(value));
  }
  const text = params.toString();
  return text ? `?${text}` : '';
}

export const getClients = (query: ClientListQueryInput, signal?: AbortSignal) =>
  api<ClientPage>(`/clients${clientListSearch(query)}`, { signal });

export const clientsQueryOptions = (query: ClientListQueryInput) =>
  queryOptions({
    queryKey: clientKeys.list(query),
    queryFn: ({ signal }) => getClients(query, signal),
    // Keep the last page on screen while the next search or page loads.
    placeholderData: keepPreviousData,
  });

export const useClients = (query: ClientListQueryInput) => useQuery(clientsQueryOptions(query));
