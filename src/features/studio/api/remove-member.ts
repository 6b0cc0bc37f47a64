import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { studioKeys } from './studio-keys';

export const removeMember = (id: number) => api<void>(`/studio/members/${id}`, { method: 'DELETE' });

/** Removes a member from the studio; the list reloads after. */
export function useRemoveMember({ onSuccess }: { onSuccess?: () => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: removeMember,
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: studioKeys.members() });
      onSuccess?.();
    },
  });
}
