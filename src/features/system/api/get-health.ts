import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export interface Health {
  status: 'ok' | 'degraded';
  database: 'up' | 'down';
  latencyMs?: number;
}

export const systemKeys = {
  all: ['system'] as const,
  health: () => [...systemKeys.all, 'health'] as const,
};

export const getHealth = (signal?: AbortSignal) => api<Health>('/health', { signal });

export const healthQueryOptions = () =>
  queryOptions({ queryKey: systemKeys.health(), queryFn: ({ signal }) => getHealth(signal), retry: false });

export const useHealth = () => useQuery(healthQueryOptions());
