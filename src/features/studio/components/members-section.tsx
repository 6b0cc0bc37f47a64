import { useState } from 'react';
import { Alert } from '@/components/ui/alert';
import { Card } from '@/components/ui/card';
import { LoadingState } from '@/components/ui/loading-state';
import { useMembers } from '../api/get-members';
import type { MemberAction } from '../lib/member-action';
import { MemberActionDialog } from './member-action-dialog';
import { MembersTable } from './members-table';

export interface MembersSectionProps {
  currentUserId: number;
  /** After any change, e.g. to reload the signed-in member when they changed themselves. */
  onChanged?: (action: MemberAction) => void;
}

/** The studio's members with role, disable and remove, each confirmed first. */
export function MembersSection({ currentUserId, onChanged }: MembersSectionProps) {
  const members = useMembers();
  const [action, setAction] = useState<MemberAction | null>(null);
  const [done, setDone] = useState<string | null>(null);

  const count = members.data?.length ?? 0;
  return (
    <Card
      title="Members"
      description="Owners run the studio account; cutters cut and finish approved drafts. Changes take effect at once, on every device."
    >
      <div role="status" className="mb-4 empty:hidden">
        {done && (
          <Alert tone="success" announce={false}>
            {done}
          </Alert>
        )}
      </div>
      {members.isPending && <LoadingState>Loading the members…</LoadingState>}
      {members.isError && (
        <Alert tone="error" title="The members could not be loaded">
          {members.error.message}
        </Alert>
      )}
      {members.data && (
        <>
          <p className="mb-3 text-sm text-muted">
            <span className="num">{count}</span> {count === 1 ? 'member' : 'members'}
          </p>
          <MembersTable
            members={members.data}
            currentUserId={currentUserId}
            onAction={(next) => {
              setDone(null);
              setAction(next);
            }}
          />
        </>
      )}
      <MemberActionDialog
        action={action}
        currentUserId={currentUserId}
        onClose={() => setAction(null)}
        onDone={(message, finished) => {
          setAction(null);
          setDone(message);
          onChanged?.(finished);
        }}
      />
    </Card>
  );
}
