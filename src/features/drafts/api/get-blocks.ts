import { queryOptions, useQuery } from '@tanstack/react-query';
import type { BlockDto } from '@shared/schemas/block';
import { api } from '@/lib/api-client';
import { draftKeys } from './draft-keys';

export interface BlockToUse {
  block: BlockDto | null;
  reason: 'last-used' | 'newest' | 'none';
}

/** GET /api/clients/:id/blocks: the client's blocks, most recently used first. */
export const getBlocks = (clientId: number, signal?: AbortSignal) => api<{ items: BlockDto[] }>(`/clients/${clientId}/blocks`, { signal });

/** GET /api/clients/:id/blocks/to-use: the block the client's last draft used, else their newest. */
export const getBlockToUse = (clientId: number, signal?: AbortSignal) => api<BlockToUse>(`/clients/${clientId}/blocks/to-use`, { signal });

export const blocksQueryOptions = (clientId: number) =>
  queryOptions({ queryKey: draftKeys.blocks(clientId), queryFn: ({ signal }) => getBlocks(clientId, signal), select: (data) => data.items });

export const blockToUseQueryOptions = (clientId: number) =>
  queryOptions({ queryKey: draftKeys.blockToUse(clientId), queryFn: ({ signal }) => getBlockToUse(clientId, signal) });

export const useBlocks = (clientId: number | null) => useQuery({ ...blocksQueryOptions(clientId ?? 0), enabled: clientId !== null });

export const useBlockToUse = (clientId: number | null) => useQuery({ ...blockToUseQueryOptions(clientId ?? 0), enabled: clientId !== null });
