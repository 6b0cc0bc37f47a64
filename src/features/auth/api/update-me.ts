import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { MeResponse, ProfileUpdateInput } from '@shared/schemas/auth';
import { api } from '@/lib/api-client';
import { authKeys } from './auth-keys';

/** A wrong current password answers 400 with a field error; a 401 means the session ended. */
export const updateMe = (body: ProfileUpdateInput) => api<MeResponse>('/auth/me', { method: 'PATCH', body });

export function useUpdateMe({ onSuccess }: { onSuccess?: (me: MeResponse) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateMe,
    onSuccess: async (me) => {
      queryClient.setQueryData(authKeys.me(), me);
      await queryClient.invalidateQueries({ queryKey: authKeys.me() });
      onSuccess?.(me);
    },
  });
}
