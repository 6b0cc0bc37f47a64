import { queryOptions, useQuery } from '@tanstack/react-query';
import type { SwatchList, SwatchOne } from '@shared/schemas/photo';
import { api } from '@/lib/api-client';
import { swatchKeys } from './photo-keys';

export const getSwatches = (signal?: AbortSignal) => api<SwatchList>('/swatches', { signal });
export const getSwatch = (fabricId: number, signal?: AbortSignal) => api<SwatchOne>(`/fabrics/${fabricId}/swatch`, { signal });

/** Every swatch of the studio, for the fabrics list. */
export const swatchesQueryOptions = () => queryOptions({ queryKey: swatchKeys.list(), queryFn: ({ signal }) => getSwatches(signal) });
export const useSwatches = () => useQuery(swatchesQueryOptions());

/** One fabric's swatch (null when it has none). */
export const swatchQueryOptions = (fabricId: number) =>
  queryOptions({ queryKey: swatchKeys.detail(fabricId), queryFn: ({ signal }) => getSwatch(fabricId, signal) });
export const useSwatch = (fabricId: number) => useQuery(swatchQueryOptions(fabricId));
