import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { StudioResponse, StudioUpdateInput } from '@shared/schemas/auth';
import { api } from '@/lib/api-client';
import { studioKeys } from './studio-keys';

export const updateStudio = (body: StudioUpdateInput) => api<StudioResponse>('/studio', { method: 'PATCH', body });

export function useUpdateStudio({ onSuccess }: { onSuccess?: (studio: StudioResponse) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateStudio,
    onSuccess: async (studio) => {
      queryClient.setQueryData(studioKeys.detail(), studio);
      await queryClient.invalidateQueries({ queryKey: studioKeys.detail() });
      onSuccess?.(studio);
    },
  });
}
