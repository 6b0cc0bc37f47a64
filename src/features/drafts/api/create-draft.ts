import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { DraftDto } from '@shared/schemas/draft-dto';
import type { ParamsMm } from '@shared/schemas/style';
import { api } from '@/lib/api-client';
import { draftKeys } from './draft-keys';

export interface DraftCreateBody {
  clientId?: number;
  blockId?: number;
  styleId: number;
  fabricId: number;
  params?: ParamsMm;
  dueOn?: string | null;
  notes?: string;
}

/** POST /api/drafts (owner): revision 1 of a new draft. */
export const createDraft = (body: DraftCreateBody) => api<DraftDto>('/drafts', { method: 'POST', body });

export function useCreateDraft({ onSuccess }: { onSuccess?: (draft: DraftDto) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createDraft,
    onSuccess: async (draft) => {
      queryClient.setQueryData(draftKeys.detail(draft.id), draft);
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: draftKeys.lists() }),
        queryClient.invalidateQueries({ queryKey: draftKeys.blocks(draft.client.id) }),
      ]);
      onSuccess?.(draft);
    },
  });
}
