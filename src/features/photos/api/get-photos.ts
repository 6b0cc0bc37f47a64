import { queryOptions, useQuery } from '@tanstack/react-query';
import type { PhotoList } from '@shared/schemas/photo';
import { api } from '@/lib/api-client';
import { photoKeys } from './photo-keys';

export const getPhotos = (clientId: number, signal?: AbortSignal) => api<PhotoList>(`/clients/${clientId}/photos`, { signal });

export const photosQueryOptions = (clientId: number) =>
  queryOptions({ queryKey: photoKeys.list(clientId), queryFn: ({ signal }) => getPhotos(clientId, signal) });

export const usePhotos = (clientId: number) => useQuery(photosQueryOptions(clientId));
