import { useMutation } from '@tanstack/react-query';
import type { ResetRequestInput, ResetRequestResponse } from '@shared/schemas/mail';
import { api } from '@/lib/api-client';

export const requestReset = (body: ResetRequestInput) =>
  api<ResetRequestResponse>('/auth/password-reset', { method: 'POST', body, quiet401: true });

/** Asks for a reset link; the answer is the same whether or not the address has an account. */
export function useRequestReset({ onSuccess }: { onSuccess?: (answer: ResetRequestResponse) => void } = {}) {
  return useMutation({ mutationFn: requestReset, onSuccess: (answer) => onSuccess?.(answer) });
}
