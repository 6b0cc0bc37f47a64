import { Alert } from '@/components/ui/alert';
import { ButtonLink } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { LoadingState } from '@/components/ui/loading-state';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { meQueryOptions } from '@/features/auth/api/get-me';
import { OwnersOnly } from '@/features/auth/components/owners-only';
import { isOwner } from '@/features/auth/hooks/use-member';
import { mailQueryOptions, useMail } from '@/features/mail/api/get-mail';
import { MailTable } from '@/features/mail/components/mail-table';
import { queryClient } from '@/lib/query-client';

export async function studioMailLoader() {
  const me = await queryClient.ensureQueryData(meQueryOptions());
  if (isOwner(me)) await queryClient.ensureQueryData(mailQueryOptions());
  return null;
}

function SentMail() {
  const mail = useMail();
  const sink = mail.data?.sink;
  return (
    <div className="mx-auto max-w-5xl">
      <PageHeader
        eyebrow={
          <ButtonLink to={paths.studio.href()} variant="ghost" compact className="-ml-3">
            ← Studio
          </ButtonLink>
        }
        title="Sent mail"
        description="Every message the studio sent: invitations, password resets, measurements and patterns."
        actions={
          <ButtonLink to={paths.studioInvitations.href()} compact>
            Invitations
          </ButtonLink>
        }
      />
      {sink && (
        <Alert tone="info" title="Mail stays on this machine" className="mb-6">
          Knitwright delivers to its local mail sink at{' '}
          <span className="num font-medium">
            {sink.host}:{sink.port}
          </span>{' '}
          and keeps each message here; nothing reaches the addresses. To send real e-mail, set SMTP_URL to your mail server.
        </Alert>
      )}
      <Card title="Messages">
        {mail.isPending && <LoadingState>Loading the messages…</LoadingState>}
        {mail.isError && (
          <Alert tone="error" title="The messages could not be loaded">
            {mail.error.message}
          </Alert>
        )}
        {mail.data && mail.data.messages.length === 0 && (
          <p className="text-muted">
            {sink
              ? 'No messages yet. Invite a member, or e-mail a client their measurements, and the message appears here.'
              : 'Mail goes out through your mail server (SMTP_URL), which keeps the copies: look in its sent folder. The sends are listed on each client and draft.'}
          </p>
        )}
        {mail.data && mail.data.messages.length > 0 && <MailTable messages={mail.data.messages} />}
      </Card>
    </div>
  );
}

export function StudioMailRoute() {
  return (
    <OwnersOnly what="The studio's sent mail">
      <SentMail />
    </OwnersOnly>
  );
}
