import { queryOptions, useQuery } from '@tanstack/react-query';
import type { MeasurementSetList } from '@shared/schemas/measurement';
import { api } from '@/lib/api-client';
import { measurementKeys } from './measurement-keys';

/** The current version of each of a client's sets, newest fitting first. */
export const getMeasurementSets = (clientId: number, signal?: AbortSignal) =>
  api<MeasurementSetList>(`/clients/${clientId}/measurements`, { signal });

export const measurementSetsQueryOptions = (clientId: number) =>
  queryOptions({ queryKey: measurementKeys.list(clientId), queryFn: ({ signal }) => getMeasurementSets(clientId, signal) });

export const useMeasurementSets = (clientId: number) => useQuery(measurementSetsQueryOptions(clientId));
