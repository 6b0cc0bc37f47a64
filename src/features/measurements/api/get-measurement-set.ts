import { queryOptions, useQuery } from '@tanstack/react-query';
import type { MeasurementSetDetail, MeasurementSetView } from '@shared/schemas/measurement';
import { api } from '@/lib/api-client';
import { measurementKeys } from './measurement-keys';

/** A set's current version with the list of all its versions. */
export const getMeasurementSet = (clientId: number, setId: number, signal?: AbortSignal) =>
  api<MeasurementSetDetail>(`/clients/${clientId}/measurements/${setId}`, { signal });

/** One earlier (or the current) version of a set, exactly as it was recorded. */
export const getMeasurementSetVersion = (clientId: number, setId: number, version: number, signal?: AbortSignal) =>
  api<MeasurementSetView>(`/clients/${clientId}/measurements/${setId}/versions/${version}`, { signal });

export const measurementSetQueryOptions = (clientId: number, setId: number) =>
  queryOptions({
    queryKey: measurementKeys.detail(clientId, setId),
    queryFn: ({ signal }) => getMeasurementSet(clientId, setId, signal),
  });

export const measurementSetVersionQueryOptions = (clientId: number, setId: number, version: number) =>
  queryOptions({
    queryKey: measurementKeys.version(clientId, setId, version),
    queryFn: ({ signal }) => getMeasurementSetVersion(clientId, setId, version, signal),
    // A version, once recorded, never changes.
    staleTime: Infinity,
  });

export const useMeasurementSet = (clientId: number, setId: number | null) =>
  useQuery({ ...measurementSetQueryOptions(clientId, setId ?? 0), enabled: setId !== null });

export const useMeasurementSetVersion = (clientId: number, setId: number, version: number | null) =>
  useQuery({ ...measurementSetVersionQueryOptions(clientId, setId, version ?? 0), enabled: version !== null });
