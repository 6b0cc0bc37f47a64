import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ResetConfirmInput } from '@shared/schemas/mail';
import { api } from '@/lib/api-client';
import { resetKeys } from './reset-keys';

export interface ResetConfirmVariables extends ResetConfirmInput {
  token: string;
}

export const confirmReset = ({ token, password }: ResetConfirmVariables) =>
  api<void>(`/auth/password-reset/${encodeURIComponent(token)}`, { method: 'POST', body: { password }, quiet401: true });

/** Sets the new password; every session of the member ends, so everything cached is dropped. */
export function useConfirmReset({ onSuccess }: { onSuccess?: () => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: confirmReset,
    onSuccess: () => {
      queryClient.clear();
      void queryClient.invalidateQueries({ queryKey: resetKeys.all });
      onSuccess?.();
    },
  });
}
