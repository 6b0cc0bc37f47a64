import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { DeliveryView, DraftSendInput } from '@shared/schemas/mail';
import { api } from '@/lib/api-client';
import { mailKeys } from './mail-keys';

export interface SendDraftVariables {
  draftId: number;
  /** Already checked with DraftSendSchema (the server checks it again). */
  body: DraftSendInput;
}

export const sendDraft = ({ draftId, body }: SendDraftVariables) => api<DeliveryView>(`/drafts/${draftId}/send`, { method: 'POST', body });

/**
 * E-mails one of a draft's documents as a PDF the server makes; the draft's sends and the
 * sent mail reload, whether it went or failed (a failed send is recorded too).
 */
export function useSendDraft({ onSuccess }: { onSuccess?: (delivery: DeliveryView) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: sendDraft,
    onSettled: (_d, _e, { draftId }) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: mailKeys.draftDeliveries(draftId) }),
        queryClient.invalidateQueries({ queryKey: mailKeys.list() }),
      ]),
    onSuccess: (delivery) => onSuccess?.(delivery),
  });
}
