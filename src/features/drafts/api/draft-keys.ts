/** Query keys of drafts, styles and blocks: one factory, so mutations invalidate the same keys. */
export interface DraftListFilters {
  clientId?: number;
  state?: string;
  sort?: 'updated' | 'created' | 'due';
  page?: number;
}

export const draftKeys = {
  all: ['drafts'] as const,
  lists: () => [...draftKeys.all, 'list'] as const,
  list: (filters: DraftListFilters) => [...draftKeys.lists(), filters] as const,
  details: () => [...draftKeys.all, 'detail'] as const,
  detail: (id: number) => [...draftKeys.details(), id] as const,
  revisions: (id: number) => [...draftKeys.detail(id), 'revisions'] as const,
  revision: (id: number, rev: number) => [...draftKeys.revisions(id), rev] as const,
  styles: () => [...draftKeys.all, 'styles'] as const,
  blocks: (clientId: number) => [...draftKeys.all, 'blocks', clientId] as const,
  blockToUse: (clientId: number) => [...draftKeys.blocks(clientId), 'to-use'] as const,
};
