import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { photoKeys } from './photo-keys';

export const deletePhoto = (id: number) => api<void>(`/photos/${id}`, { method: 'DELETE' });

export function useDeletePhoto(clientId: number, { onSuccess }: { onSuccess?: () => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deletePhoto,
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: photoKeys.list(clientId) });
      onSuccess?.();
    },
  });
}
