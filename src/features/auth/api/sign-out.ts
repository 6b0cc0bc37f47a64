import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { displayUnitReset } from '@/lib/unit';

export const signOut = () => api<void>('/auth/signout', { method: 'POST', quiet401: true });

/**
 * Signs out on the server. The caller then loads the sign-in page afresh (a full page load), so
 * nothing of the member's studio stays in memory on a shared tablet.
 */
export function useSignOut({ onSuccess }: { onSuccess?: () => void } = {}) {
  return useMutation({
    mutationFn: signOut,
    onSuccess: () => {
      displayUnitReset();
      onSuccess?.();
    },
  });
}
