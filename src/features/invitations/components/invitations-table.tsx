import type { InvitationStatus, InvitationView } from '@shared/schemas/mail';
import { Badge, type BadgeTone } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { Table, Td, Th } from '@/components/ui/table';
import type { InvitationChange } from '../api/change-invitation';

export interface InvitationsTableProps {
  invitations: readonly InvitationView[];
  /** Asks for a resend or a revoke; the caller confirms a revoke first. */
  onChange: (invitation: InvitationView, change: InvitationChange) => void;
  /** The invitation whose change is on its way, shown busy. */
  busyId?: number | null;
}

const STATUS: Record<InvitationStatus, { label: string; tone: BadgeTone }> = {
  open: { label: 'Waiting', tone: 'accent' },
  accepted: { label: 'Accepted', tone: 'neutral' },
  revoked: { label: 'Revoked', tone: 'danger' },
  expired: { label: 'Expired', tone: 'warn' },
};

const when = (iso: string) => new Date(iso).toLocaleString(undefined, { month: 'short', day: 'numeric', hour: '2-digit', minute: '2-digit' });

function statusDetail(inv: InvitationView): string {
  if (inv.status === 'open') return `Link works until ${when(inv.expiresAt)}`;
  if (inv.status === 'accepted' && inv.acceptedAt) return `Joined ${when(inv.acceptedAt)}`;
  if (inv.status === 'revoked' && inv.revokedAt) return `Revoked ${when(inv.revokedAt)}`;
  return `Link ran out ${when(inv.expiresAt)}`;
}

/** Every invitation with its state; waiting and expired ones can be resent or revoked. */
export function InvitationsTable({ invitations, onChange, busyId }: InvitationsTableProps) {
  return (
    <Table caption="Invitations of the studio" captionHidden>
      <thead>
        <tr>
          <Th>Invited</Th>
          <Th>Role</Th>
          <Th>State</Th>
          <Th className="hidden md:table-cell">Last sent</Th>
          <Th>
            <span className="sr-only">Actions</span>
          </Th>
        </tr>
      </thead>
      <tbody>
        {invitations.map((inv) => {
          const live = inv.status === 'open' || inv.status === 'expired';
          return (
            <tr key={inv.id} data-testid={`invitation-${inv.email}`}>
              <Th scope="row">
                <span className="break-words">{inv.email}</span>
                {inv.invitedBy && <span className="block text-sm font-normal text-muted">by {inv.invitedBy}</span>}
              </Th>
              <Td>{inv.role === 'owner' ? 'Owner' : 'Cutter'}</Td>
              <Td>
                <Badge tone={STATUS[inv.status].tone}>{STATUS[inv.status].label}</Badge>
                <span className="mt-1 block text-sm text-muted">{statusDetail(inv)}</span>
              </Td>
              <Td className="num hidden whitespace-nowrap text-muted md:table-cell">
                {when(inv.lastSentAt)}
                {inv.sentCount > 1 && <span className="block text-sm">sent {inv.sentCount} times</span>}
              </Td>
              <Td>
                {live && (
                  <div className="flex flex-wrap justify-end gap-2">
                    <Button compact aria-label={`Resend: ${inv.email}`} pending={busyId === inv.id} onClick={() => onChange(inv, 'resend')}>
                      Resend
                    </Button>
                    <Button compact aria-label={`Revoke: ${inv.email}`} onClick={() => onChange(inv, 'revoke')}>
                      Revoke
                    </Button>
                  </div>
                )}
              </Td>
            </tr>
          );
        })}
      </tbody>
    </Table>
  );
}
