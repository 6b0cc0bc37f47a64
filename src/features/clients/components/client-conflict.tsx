import type { ClientView } from '@shared/schemas/client';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { cx } from '@/components/ui/cx';
import type { ClientFormValues } from './client-form';
import { dateFormat } from '@/lib/dates';

interface ClientConflictProps {
  mine: ClientFormValues;
  current: ClientView;
  showContact: boolean;
  pending: boolean;
  /** Save my copy on top of the one saved meanwhile. */
  onKeepMine: () => void;
  /** Drop my changes and load the saved copy into the form. */
  onTakeTheirs: () => void;
}

const ROWS = [
  ['name', 'Name'],
  ['email', 'E-mail'],
  ['phone', 'Phone'],
  ['notes', 'Notes'],
] as const;

/** Someone saved this client while it was being edited: both copies side by side, nothing lost. */
export function ClientConflict({ mine, current, showContact, pending, onKeepMine, onTakeTheirs }: ClientConflictProps) {
  const rows = ROWS.filter(([key]) => showContact || (key !== 'email' && key !== 'phone'));
  return (
    <Alert tone="warn" title="Someone else saved this client while you were editing">
      <p>
        The copy saved on {dateFormat(current.updatedAt)} is shown beside yours. Choose which to keep; your changes are still
        here until you do.
      </p>
      <table className="mt-3 w-full border-collapse text-left text-sm" data-testid="client-conflict">
        <thead>
          <tr>
            <th scope="col" className="py-1 pr-3 font-medium text-muted">
              Field
            </th>
            <th scope="col" className="py-1 pr-3 font-semibold">
              Your copy
            </th>
            <th scope="col" className="py-1 font-semibold">
              Saved copy
            </th>
          </tr>
        </thead>
        <tbody>
          {rows.map(([key, label]) => {
            const theirs = current[key] ?? '';
            const differs = (mine[key] ?? '').trim() !== theirs.trim();
            return (
              <tr key={key} className={cx('border-t border-line align-top', differs && 'bg-warn/5')}>
                <th scope="row" className="py-2 pr-3 font-medium">
                  {label}
                  {differs && <span className="block text-xs font-normal text-warn">differs</span>}
                </th>
                <td className="whitespace-pre-wrap py-2 pr-3">{mine[key] || '—'}</td>
                <td className="whitespace-pre-wrap py-2">{theirs || '—'}</td>
              </tr>
            );
          })}
        </tbody>
      </table>
      <div className="mt-4 flex flex-wrap gap-3">
        <Button variant="primary" onClick={onKeepMine} pending={pending} pendingLabel="Saving…">
          Save my copy
        </Button>
        <Button onClick={onTakeTheirs} disabled={pending}>
          Use the saved copy
        </Button>
      </div>
    </Alert>
  );
}
