import { useParams, type LoaderFunctionArgs } from 'react-router';
import { Alert } from '@/components/ui/alert';
import { ButtonLink } from '@/components/ui/button';
import { LoadingState } from '@/components/ui/loading-state';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { meQueryOptions } from '@/features/auth/api/get-me';
import { OwnersOnly } from '@/features/auth/components/owners-only';
import { isOwner } from '@/features/auth/hooks/use-member';
import { mailMessageQueryOptions, useMailMessage } from '@/features/mail/api/get-mail-message';
import { MailMessageView } from '@/features/mail/components/mail-message-view';
import { queryClient } from '@/lib/query-client';

/** The message id in the address, or a 404 for anything else. */
function messageIdParam(raw: string | undefined): number {
  const id = Number(raw);
  if (!Number.isInteger(id) || id < 1) throw new Response('No such message', { status: 404, statusText: 'No such message' });
  return id;
}

export async function studioMailMessageLoader({ params }: LoaderFunctionArgs) {
  const id = messageIdParam(params.messageId);
  const me = await queryClient.ensureQueryData(meQueryOptions());
  if (isOwner(me)) await queryClient.prefetchQuery(mailMessageQueryOptions(id));
  return null;
}

function Message() {
  const id = messageIdParam(useParams().messageId);
  const message = useMailMessage(id);
  return (
    <div className="mx-auto max-w-5xl">
      <PageHeader
        eyebrow={
          <ButtonLink to={paths.studioMail.href()} variant="ghost" compact className="-ml-3">
            ← Sent mail
          </ButtonLink>
        }
        title={message.data?.subject || 'Message'}
      />
      {message.isPending && <LoadingState>Loading the message…</LoadingState>}
      {message.isError && (
        <Alert tone="error" title="This message could not be opened">
          {message.error.message}
        </Alert>
      )}
      {message.data && <MailMessageView message={message.data} />}
    </div>
  );
}

export function StudioMailMessageRoute() {
  return (
    <OwnersOnly what="The studio's sent mail">
      <Message />
    </OwnersOnly>
  );
}
