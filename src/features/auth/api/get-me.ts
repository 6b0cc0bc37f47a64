import { queryOptions, useQuery } from '@tanstack/react-query';
import type { MeResponse } from '@shared/schemas/auth';
import { api, ApiError } from '@/lib/api-client';
import { authKeys } from './auth-keys';

/** Who is signed in, or null when nobody is (a 401 is an answer here, not a failure). */
export async function getMe(signal?: AbortSignal): Promise<MeResponse | null> {
  try {
    return await api<MeResponse>('/auth/me', { signal, quiet401: true });
  } catch (error) {
    if (error instanceof ApiError && error.status === 401) return null;
    throw error;
  }
}

export const meQueryOptions = () =>
  queryOptions({
    queryKey: authKeys.me(),
    queryFn: ({ signal }) => getMe(signal),
    // Role and studio changes must show soon; a minute keeps navigation instant.
    staleTime: 60_000,
  });

/** The signed-in member (null when signed out). */
export const useMe = () => useQuery(meQueryOptions());
