import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ClientView } from '@shared/schemas/client';
import { api } from '@/lib/api-client';
import { clientKeys } from './client-keys';

/** Archives a client (hidden from the active list, nothing deleted) or restores one. */
export const clientArchiveSet = (id: number, archived: boolean) =>
  api<ClientView>(`/clients/${id}/${archived ? 'archive' : 'restore'}`, { method: 'POST' });

export function useArchiveClient(id: number, { onSuccess }: { onSuccess?: (client: ClientView) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (archived: boolean) => clientArchiveSet(id, archived),
    onSuccess: async (client) => {
      queryClient.setQueryData(clientKeys.detail(id), client);
      await queryClient.invalidateQueries({ queryKey: clientKeys.lists() });
      onSuccess?.(client);
    },
  });
}
