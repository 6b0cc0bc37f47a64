import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { MeasurementSetCreateInput, MeasurementSetView } from '@shared/schemas/measurement';
import { api } from '@/lib/api-client';
import { measurementKeys } from './measurement-keys';

export const createMeasurementSet = (clientId: number, body: MeasurementSetCreateInput) =>
  api<MeasurementSetView>(`/clients/${clientId}/measurements`, { method: 'POST', body });

export function useCreateMeasurementSet(clientId: number, { onSuccess }: { onSuccess?: (set: MeasurementSetView) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: MeasurementSetCreateInput) => createMeasurementSet(clientId, body),
    onSuccess: async (set) => {
      await queryClient.invalidateQueries({ queryKey: measurementKeys.client(clientId) });
      onSuccess?.(set);
    },
  });
}
