import { queryOptions, useQuery } from '@tanstack/react-query';
import type { FabricView } from '@shared/schemas/fabric';
import { api } from '@/lib/api-client';
import { fabricKeys } from './fabric-keys';

export const getFabric = (id: number, signal?: AbortSignal) => api<FabricView>(`/fabrics/${id}`, { signal });

export const fabricQueryOptions = (id: number) =>
  queryOptions({ queryKey: fabricKeys.detail(id), queryFn: ({ signal }) => getFabric(id, signal) });

export const useFabric = (id: number | null) => useQuery({ ...fabricQueryOptions(id ?? 0), enabled: id !== null });
