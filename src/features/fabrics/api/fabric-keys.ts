/** Query keys of fabrics; everything under `all` is refreshed when a fabric changes. */
export const fabricKeys = {
  all: ['fabrics'] as const,
  lists: () => [...fabricKeys.all, 'list'] as const,
  list: (query: FabricListParams) => [...fabricKeys.lists(), query] as const,
  details: () => [...fabricKeys.all, 'detail'] as const,
  detail: (id: number) => [...fabricKeys.details(), id] as const,
};

/** What the fabrics list asks for. */
export interface FabricListParams {
  q?: string;
  sort?: 'name' | 'updatedAt' | 'stretchCrosswise';
  order?: 'asc' | 'desc';
  page?: number;
  pageSize?: number;
}
