/** Query keys of the owner's studio screen. */
export const studioKeys = {
  all: ['studio'] as const,
  detail: () => [...studioKeys.all, 'detail'] as const,
  members: () => [...studioKeys.all, 'members'] as const,
};
