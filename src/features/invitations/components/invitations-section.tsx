import { useState } from 'react';
import type { InvitationView } from '@shared/schemas/mail';
import { Alert } from '@/components/ui/alert';
import { Card } from '@/components/ui/card';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { LoadingState } from '@/components/ui/loading-state';
import { useChangeInvitation } from '../api/change-invitation';
import { useInvitations } from '../api/get-invitations';
import { InvitationsTable } from './invitations-table';
import { InviteForm } from './invite-form';

/** Invite people by e-mail, and follow, resend or revoke the invitations sent. */
export function InvitationsSection() {
  const invitations = useInvitations();
  const [done, setDone] = useState<string | null>(null);
  const [revoking, setRevoking] = useState<InvitationView | null>(null);
  const change = useChangeInvitation({
    onSuccess: (inv, kind) => {
      setRevoking(null);
      setDone(kind === 'resend' ? `A new link went to ${inv.email}; the earlier one no longer works.` : `The invitation to ${inv.email} was revoked: its link no longer works.`);
    },
  });

  return (
    <div className="space-y-6">
      <Card title="Invite someone" description="They get an e-mail with a link that works once, for 72 hours. Accepting it sets their name and password.">
        <InviteForm onInvited={(inv) => setDone(`Invitation sent to ${inv.email}.`)} />
      </Card>
      <Card title="Invitations" description="Resending sends a new link and makes the earlier one useless; revoking stops the link at once.">
        <div role="status" className="mb-4 empty:hidden">
          {done && (
            <Alert tone="success" announce={false}>
              {done}
            </Alert>
          )}
        </div>
        {change.isError && !revoking && (
          <Alert tone="error" title="Not changed" className="mb-4">
            {change.error.message}
          </Alert>
        )}
        {invitations.isPending && <LoadingState>Loading the invitations…</LoadingState>}
        {invitations.isError && (
          <Alert tone="error" title="The invitations could not be loaded">
            {invitations.error.message}
          </Alert>
        )}
        {invitations.data?.length === 0 && <p className="text-muted">No invitations yet. Invite a cutter above to give them their own sign-in.</p>}
        {invitations.data && invitations.data.length > 0 && (
          <InvitationsTable
            invitations={invitations.data}
            busyId={change.isPending && change.variables.change === 'resend' ? change.variables.id : null}
            onChange={(inv, kind) => {
              setDone(null);
              change.reset();
              if (kind === 'revoke') setRevoking(inv);
              else change.mutate({ id: inv.id, change: 'resend' });
            }}
          />
        )}
      </Card>
      <ConfirmDialog
        open={revoking !== null}
        title={`Revoke the invitation to ${revoking?.email ?? ''}?`}
        description="The link in the e-mail stops working at once. You can invite the address again later."
        confirmLabel="Revoke the invitation"
        tone="danger"
        pending={change.isPending}
        error={change.error?.message ?? null}
        onConfirm={() => revoking && change.mutate({ id: revoking.id, change: 'revoke' })}
        onCancel={() => setRevoking(null)}
      />
    </div>
  );
}
