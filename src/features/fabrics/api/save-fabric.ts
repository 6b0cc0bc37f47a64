import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { FabricCreateInput, FabricUpdateInput, FabricView } from '@shared/schemas/fabric';
import { api, ApiError } from '@/lib/api-client';
import { fabricKeys } from './fabric-keys';

export const createFabric = (body: FabricCreateInput) => api<FabricView>('/fabrics', { method: 'POST', body });

export const updateFabric = (id: number, body: FabricUpdateInput) => api<FabricView>(`/fabrics/${id}`, { method: 'PATCH', body });

/** The current copy the server sent with a 409, when someone else saved the fabric first. */
export function fabricConflictCurrent(error: unknown): FabricView | null {
  if (!(error instanceof ApiError) || error.status !== 409) return null;
  const current = error.current as FabricView | undefined;
  return current && typeof current === 'object' && typeof current.version === 'number' ? current : null;
}

/** Creates a fabric, or changes one when `id` is given. */
export function useSaveFabric(id: number | null, { onSuccess }: { onSuccess?: (fabric: FabricView) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ version, ...body }: FabricCreateInput & { version?: number }) =>
      id === null ? createFabric(body) : updateFabric(id, { ...body, version: version ?? 0 }),
    onSuccess: async (fabric) => {
      queryClient.setQueryData(fabricKeys.detail(fabric.id), fabric);
      await queryClient.invalidateQueries({ queryKey: fabricKeys.lists() });
      onSuccess?.(fabric);
    },
  });
}
