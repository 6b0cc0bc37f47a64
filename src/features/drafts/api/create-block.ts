import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { BlockDto } from '@shared/schemas/block';
import { api } from '@/lib/api-client';
import { draftKeys } from './draft-keys';

export interface BlockCreateBody {
  clientId: number;
  measurementSetId: number;
  name?: string;
}

/** POST /api/clients/:id/blocks (owner): a block from one of the client's measurement sets. */
export const createBlock = ({ clientId, ...body }: BlockCreateBody) => api<BlockDto>(`/clients/${clientId}/blocks`, { method: 'POST', body });

export function useCreateBlock({ onSuccess }: { onSuccess?: (block: BlockDto) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createBlock,
    onSuccess: async (block) => {
      await queryClient.invalidateQueries({ queryKey: draftKeys.blocks(block.clientId) });
      onSuccess?.(block);
    },
  });
}
