/** Query keys of fitting photos and fabric swatches; uploads and deletes invalidate through these. */
export const photoKeys = {
  all: ['photos'] as const,
  list: (clientId: number) => [...photoKeys.all, 'client', clientId] as const,
};

export const swatchKeys = {
  all: ['swatches'] as const,
  list: () => [...swatchKeys.all, 'list'] as const,
  detail: (fabricId: number) => [...swatchKeys.all, 'fabric', fabricId] as const,
};
