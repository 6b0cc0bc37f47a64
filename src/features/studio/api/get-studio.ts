import { queryOptions, useQuery } from '@tanstack/react-query';
import type { StudioResponse } from '@shared/schemas/auth';
import { api } from '@/lib/api-client';
import { studioKeys } from './studio-keys';

export const getStudio = (signal?: AbortSignal) => api<StudioResponse>('/studio', { signal });

export const studioQueryOptions = () => queryOptions({ queryKey: studioKeys.detail(), queryFn: ({ signal }) => getStudio(signal) });

/** The studio's name and defaults (owners only). */
export const useStudio = () => useQuery(studioQueryOptions());
