/** Query keys of measurement sets, grouped by client so one invalidation refreshes a client's history. */
export const measurementKeys = {
  all: ['measurements'] as const,
  client: (clientId: number) => [...measurementKeys.all, 'client', clientId] as const,
  list: (clientId: number) => [...measurementKeys.client(clientId), 'list'] as const,
  detail: (clientId: number, setId: number) => [...measurementKeys.client(clientId), 'set', setId] as const,
  version: (clientId: number, setId: number, version: number) =>
    [...measurementKeys.detail(clientId, setId), 'version', version] as const,
};
