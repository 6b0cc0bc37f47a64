import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { DraftDto } from '@shared/schemas/draft-dto';
import { api } from '@/lib/api-client';
import { draftKeys } from './draft-keys';

export interface RevisionRestore {
  id: number;
  rev: number;
  version: number;
}

/** POST /api/drafts/:id/revisions/:rev/restore (owner, drafting): a new revision with that one's values. */
export const restoreRevision = ({ id, rev, version }: RevisionRestore) =>
  api<DraftDto>(`/drafts/${id}/revisions/${rev}/restore`, { method: 'POST', body: { version } });

export function useRestoreRevision({ onSuccess }: { onSuccess?: (draft: DraftDto) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: restoreRevision,
    onSuccess: async (draft) => {
      queryClient.setQueryData(draftKeys.detail(draft.id), draft);
      await queryClient.invalidateQueries({ queryKey: draftKeys.revisions(draft.id) });
      onSuccess?.(draft);
    },
  });
}
