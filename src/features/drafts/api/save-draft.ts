import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { DraftDto } from '@shared/schemas/draft-dto';
import type { ParamsMm } from '@shared/schemas/style';
import { api } from '@/lib/api-client';
import { draftKeys } from './draft-keys';

export interface DraftSaveBody {
  id: number;
  /** The version last read: a stale one answers 409 with the draft as it is now. */
  version: number;
  params?: ParamsMm;
  dueOn?: string | null;
  notes?: string;
}

/** PATCH /api/drafts/:id (owner, drafting): a save, which makes a revision when something changed. */
export const saveDraft = ({ id, ...body }: DraftSaveBody) => api<DraftDto>(`/drafts/${id}`, { method: 'PATCH', body });

export function useSaveDraft({ onSuccess }: { onSuccess?: (draft: DraftDto) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveDraft,
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
