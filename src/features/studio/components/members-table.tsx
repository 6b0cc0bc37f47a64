import type { MemberView } from '@shared/schemas/auth';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { Table, Td, Th } from '@/components/ui/table';
import type { MemberAction } from '../lib/member-action';

export interface MembersTableProps {
  members: readonly MemberView[];
  currentUserId: number;
  /** Asks for a change; the caller confirms it. */
  onAction: (action: MemberAction) => void;
}

const joined = (iso: string) => new Date(iso).toLocaleDateString(undefined, { year: 'numeric', month: 'short', day: 'numeric' });

/** Everyone in the studio with their role and state, and the owner's actions on each. */
export function MembersTable({ members, currentUserId, onAction }: MembersTableProps) {
  return (
    <Table caption="Members of the studio" captionHidden>
      <thead>
        <tr>
          <Th>Member</Th>
          <Th>Role</Th>
          <Th>Account</Th>
          <Th className="hidden md:table-cell">Joined</Th>
          <Th>
            <span className="sr-only">Actions</span>
          </Th>
        </tr>
      </thead>
      <tbody>
        {members.map((m) => {
          const self = m.id === currentUserId;
          // The visible words start the accessible name (WCAG 2.2 SC 2.5.3 Label in Name).
          const roleLabel = m.role === 'owner' ? 'Make cutter' : 'Make owner';
          return (
            <tr key={m.id} data-testid={`member-${m.email}`}>
              <Th scope="row">
                {m.name}
                {self && <span className="ml-2 text-sm font-normal text-muted"> (you)</span>}
                <span className="block text-sm font-normal break-words text-muted">{m.email}</span>
              </Th>
              <Td>
                <Badge tone={m.role === 'owner' ? 'accent' : 'neutral'}>{m.role === 'owner' ? 'Owner' : 'Cutter'}</Badge>
              </Td>
              <Td>{m.disabled ? <Badge tone="danger">Disabled</Badge> : <Badge>Active</Badge>}</Td>
              <Td className="num hidden whitespace-nowrap text-muted md:table-cell">{joined(m.createdAt)}</Td>
              <Td>
                <div className="flex flex-wrap justify-end gap-2">
                  <Button
                    compact
                    aria-label={`${roleLabel}: ${m.name}`}
                    onClick={() => onAction({ kind: 'role', member: m, role: m.role === 'owner' ? 'cutter' : 'owner' })}
                  >
                    {roleLabel}
                  </Button>
                  {!self && (
                    <>
                      <Button
                        compact
                        aria-label={`${m.disabled ? 'Enable' : 'Disable'}: ${m.name}`}
                        onClick={() => onAction({ kind: m.disabled ? 'enable' : 'disable', member: m })}
                      >
                        {m.disabled ? 'Enable' : 'Disable'}
                      </Button>
                      <Button
                        compact
                        variant="danger-ghost"
                        aria-label={`Remove: ${m.name}`}
                        onClick={() => onAction({ kind: 'remove', member: m })}
                      >
                        Remove
                      </Button>
                    </>
                  )}
                </div>
              </Td>
            </tr>
          );
        })}
      </tbody>
    </Table>
  );
}
