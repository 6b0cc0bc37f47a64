import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { MeResponse, SignUpInput } from '@shared/schemas/auth';
import { api } from '@/lib/api-client';
import { authKeys } from './auth-keys';

export const signUp = (body: SignUpInput) => api<MeResponse>('/auth/signup', { method: 'POST', body });

export function useSignUp({ onSuccess }: { onSuccess?: (me: MeResponse) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signUp,
    onSuccess: (me) => {
      queryClient.clear();
      queryClient.setQueryData(authKeys.me(), me);
      onSuccess?.(me);
    },
  });
}
