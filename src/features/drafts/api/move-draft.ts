import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { DraftStateChange } from '@shared/schemas/draft';
import type { DraftDto } from '@shared/schemas/draft-dto';
import { api } from '@/lib/api-client';
import { draftKeys } from './draft-keys';

export type DraftMove = { id: number } & DraftStateChange;

/** POST /api/drafts/:id/state: approve, reopen, mark cut, sewn or delivered. */
export const moveDraft = ({ id, ...body }: DraftMove) => api<DraftDto>(`/drafts/${id}/state`, { method: 'POST', body });

export function useMoveDraft({ onSuccess }: { onSuccess?: (draft: DraftDto) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: moveDraft,
    onSuccess: async (draft) => {
      queryClient.setQueryData(draftKeys.detail(draft.id), draft);
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: draftKeys.revisions(draft.id) }),
        queryClient.invalidateQueries({ queryKey: draftKeys.lists() }),
      ]);
      onSuccess?.(draft);
    },
  });
}
