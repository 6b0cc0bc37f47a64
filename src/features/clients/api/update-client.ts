import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ClientUpdateInput, ClientView } from '@shared/schemas/client';
import { api, ApiError } from '@/lib/api-client';
import { clientKeys } from './client-keys';

export const updateClient = (id: number, body: ClientUpdateInput) =>
  api<ClientView>(`/clients/${id}`, { method: 'PATCH', body });

/** The current copy the server sent with a 409, when someone else saved first. */
export function clientConflictCurrent(error: unknown): ClientView | null {
  if (!(error instanceof ApiError) || error.status !== 409) return null;
  const current = error.current as ClientView | undefined;
  return current && typeof current === 'object' && typeof current.version === 'number' ? current : null;
}

export function useUpdateClient(id: number, { onSuccess }: { onSuccess?: (client: ClientView) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: ClientUpdateInput) => updateClient(id, body),
    onSuccess: async (client) => {
      queryClient.setQueryData(clientKeys.detail(id), client);
      await queryClient.invalidateQueries({ queryKey: clientKeys.lists() });
      onSuccess?.(client);
    },
  });
}
