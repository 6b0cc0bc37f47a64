/** Query keys of the printing feature. */
export const printKeys = {
  all: ['printing'] as const,
  draft: (id: number) => [...printKeys.all, 'draft', id] as const,
};
