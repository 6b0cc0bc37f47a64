import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { DeliveryView, MeasurementsSendInput } from '@shared/schemas/mail';
import { api } from '@/lib/api-client';
import { mailKeys } from './mail-keys';

export interface SendMeasurementsVariables extends MeasurementsSendInput {
  clientId: number;
}

export const sendMeasurements = ({ clientId, ...body }: SendMeasurementsVariables) =>
  api<DeliveryView>(`/clients/${clientId}/send-measurements`, { method: 'POST', body });

/** E-mails the client their latest measurements; the client's sends and the sent mail reload. */
export function useSendMeasurements({ onSuccess }: { onSuccess?: (delivery: DeliveryView) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: sendMeasurements,
    onSettled: (_d, _e, { clientId }) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: mailKeys.clientDeliveries(clientId) }),
        queryClient.invalidateQueries({ queryKey: mailKeys.list() }),
      ]),
    onSuccess: (delivery) => onSuccess?.(delivery),
  });
}
