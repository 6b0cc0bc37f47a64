import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { MeResponse, SignInInput } from '@shared/schemas/auth';
import { api } from '@/lib/api-client';
import { authKeys } from './auth-keys';

/** A wrong password answers 401: the form shows it, so it must not trigger the sign-in redirect. */
export const signIn = (body: SignInInput) => api<MeResponse>('/auth/signin', { method: 'POST', body, quiet401: true });

export function useSignIn({ onSuccess }: { onSuccess?: (me: MeResponse) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signIn,
    onSuccess: (me) => {
      // Nothing cached for a previous member may show to this one.
      queryClient.clear();
      queryClient.setQueryData(authKeys.me(), me);
      onSuccess?.(me);
    },
  });
}
