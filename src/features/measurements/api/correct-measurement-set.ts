import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { MeasurementSetCorrectInput, MeasurementSetView } from '@shared/schemas/measurement';
import { api, ApiError } from '@/lib/api-client';
import { measurementKeys } from './measurement-keys';

/** Records a correction as a new version of the set; the version corrected stays readable. */
export const correctMeasurementSet = (clientId: number, setId: number, body: MeasurementSetCorrectInput) =>
  api<MeasurementSetView>(`/clients/${clientId}/measurements/${setId}`, { method: 'PATCH', body });

/** The current version the server sent with a 409, when someone corrected the set first. */
export function setConflictCurrent(error: unknown): MeasurementSetView | null {
  if (!(error instanceof ApiError) || error.status !== 409) return null;
  const current = error.current as MeasurementSetView | undefined;
  return current && typeof current === 'object' && typeof current.version === 'number' && current.valuesMm ? current : null;
}

export function useCorrectMeasurementSet(
  clientId: number,
  setId: number,
  { onSuccess }: { onSuccess?: (set: MeasurementSetView) => void } = {},
) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: MeasurementSetCorrectInput) => correctMeasurementSet(clientId, setId, body),
    onSuccess: async (set) => {
      await queryClient.invalidateQueries({ queryKey: measurementKeys.client(clientId) });
      onSuccess?.(set);
    },
  });
}
