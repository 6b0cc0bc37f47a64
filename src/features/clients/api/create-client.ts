import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ClientCreateInput, ClientView } from '@shared/schemas/client';
import { api } from '@/lib/api-client';
import { clientKeys } from './client-keys';

export const createClient = (body: ClientCreateInput) => api<ClientView>('/clients', { method: 'POST', body });

export function useCreateClient({ onSuccess }: { onSuccess?: (client: ClientView) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createClient,
    onSuccess: async (client) => {
      queryClient.setQueryData(clientKeys.detail(client.id), client);
      await queryClient.invalidateQueries({ queryKey: clientKeys.lists() });
      onSuccess?.(client);
    },
  });
}
