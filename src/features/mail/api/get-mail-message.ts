import { queryOptions, useQuery } from '@tanstack/react-query';
import type { MailMessageView } from '@shared/schemas/mail';
import { api } from '@/lib/api-client';
import { mailKeys } from './mail-keys';

export const getMailMessage = (id: number, signal?: AbortSignal) => api<MailMessageView>(`/studio/mail/${id}`, { signal });

/** A stored message never changes: it is fetched once. */
export const mailMessageQueryOptions = (id: number) =>
  queryOptions({ queryKey: mailKeys.message(id), queryFn: ({ signal }) => getMailMessage(id, signal), staleTime: Infinity });

export const useMailMessage = (id: number) => useQuery(mailMessageQueryOptions(id));

/** Where an attachment downloads from (the session cookie goes with the link). */
export const attachmentHref = (messageId: number, attachmentId: number) => `/api/studio/mail/${messageId}/attachments/${attachmentId}`;
