/** Query keys of the signed-in member; everything under `all` is theirs. */
export const authKeys = {
  all: ['auth'] as const,
  me: () => [...authKeys.all, 'me'] as const,
};
