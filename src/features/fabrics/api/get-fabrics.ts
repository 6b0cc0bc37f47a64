import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { FabricPage } from '@shared/schemas/fabric';
import { api } from '@/lib/api-client';
import { fabricKeys, type FabricListParams } from './fabric-keys';

function search(params: FabricListParams): string {
  const query = new URLSearchParams();
  for (const [key, value] of Object.entries(params)) if (value !== undefined && value !== '') query.set(key, String(value));
  const text = query.toString();
  return text ? `?${text}` : '';
}

export const getFabrics = (params: FabricListParams, signal?: AbortSignal) => api<FabricPage>(`/fabrics${search(params)}`, { signal });

export const fabricsQueryOptions = (params: FabricListParams) =>
  queryOptions({
    queryKey: fabricKeys.list(params),
    queryFn: ({ signal }) => getFabrics(params, signal),
    placeholderData: keepPreviousData,
  });

export const useFabrics = (params: FabricListParams) => useQuery(fabricsQueryOptions(params));
