import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { resetKeys } from './reset-keys';

export const getResetLink = (token: string, signal?: AbortSignal) =>
  api<{ email: string }>(`/auth/password-reset/${encodeURIComponent(token)}`, { signal, quiet401: true });

/** Whether a reset link still works, and for which address. A used or expired link is an answer, not a retry. */
export const resetLinkQueryOptions = (token: string) =>
  queryOptions({ queryKey: resetKeys.link(token), queryFn: ({ signal }) => getResetLink(token, signal), retry: false, staleTime: 0 });

export const useResetLink = (token: string) => useQuery(resetLinkQueryOptions(token));
