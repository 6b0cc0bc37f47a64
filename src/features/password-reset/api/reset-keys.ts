/** Query keys of the password-reset pages. */
export const resetKeys = {
  all: ['password-reset'] as const,
  link: (token: string) => [...resetKeys.all, 'link', token] as const,
};
