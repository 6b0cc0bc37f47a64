import { queryOptions, useQuery } from '@tanstack/react-query';
import type { MailListResponse } from '@shared/schemas/mail';
import { api } from '@/lib/api-client';
import { mailKeys } from './mail-keys';

export const getMail = (signal?: AbortSignal) => api<MailListResponse>('/studio/mail', { signal });

export const mailQueryOptions = () => queryOptions({ queryKey: mailKeys.list(), queryFn: ({ signal }) => getMail(signal) });

/** The studio's messages as the local mail sink received them, newest first (owners only). */
export const useMail = () => useQuery(mailQueryOptions());
