import type { ClientListQueryInput } from '@shared/schemas/client';

/** Query keys of clients; everything under `all` is invalidated when a client changes. */
export const clientKeys = {
  all: ['clients'] as const,
  lists: () => [...clientKeys.all, 'list'] as const,
  list: (query: ClientListQueryInput) => [...clientKeys.lists(), query] as const,
  details: () => [...clientKeys.all, 'detail'] as const,
  detail: (id: number) => [...clientKeys.details(), id] as const,
};
