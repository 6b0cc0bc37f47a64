import { useId } from 'react';
import { controlClasses } from '@/components/ui/field';
import { cx } from '@/components/ui/cx';
import type { ClientStatus } from '../lib/list-params';

interface ClientsToolbarProps {
  search: string;
  onSearchChange: (text: string) => void;
  status: ClientStatus;
  onStatusChange: (status: ClientStatus) => void;
  /** "12 clients", announced politely as results arrive. */
  summary: string;
}

const STATUS_LABELS: [ClientStatus, string][] = [
  ['active', 'Active'],
  ['archived', 'Archived'],
  ['all', 'All'],
];

/** Search by name or e-mail, and which clients to list. */
export function ClientsToolbar({ search, onSearchChange, status, onStatusChange, summary }: ClientsToolbarProps) {
  const searchId = useId();
  const groupName = useId();
  return (
    <div className="mb-4 flex flex-wrap items-end gap-4">
      <div className="flex min-w-64 flex-1 flex-col gap-1.5">
        <label htmlFor={searchId} className="text-sm font-medium">
          Search clients
        </label>
        <input
          id={searchId}
          type="search"
          value={search}
          onChange={(e) => onSearchChange(e.target.value)}
          placeholder="Name or e-mail"
          autoComplete="off"
          spellCheck={false}
          maxLength={120}
          className={controlClasses(false)}
        />
      </div>
      <div className="flex flex-col gap-1.5">
        <span id={`${groupName}-label`} className="text-sm font-medium">
          Show
        </span>
        <div role="radiogroup" aria-labelledby={`${groupName}-label`} className="inline-flex rounded-lg border border-line bg-panel p-0.5">
          {STATUS_LABELS.map(([value, label]) => (
            <label
              key={value}
              className={cx(
                'relative flex min-h-touch cursor-pointer items-center rounded-md px-4 text-sm font-medium',
                'has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-offset-2 has-[:focus-visible]:outline-accent',
                status === value ? 'bg-accent-soft text-accent-strong' : 'text-ink hover:bg-surface',
              )}
            >
              <input type="radio" name={groupName} value={value} checked={status === value} onChange={() => onStatusChange(value)} className="absolute inset-0 m-0 cursor-pointer appearance-none opacity-0" />
              {label}
            </label>
          ))}
        </div>
      </div>
      <p role="status" className="ml-auto pb-3 text-sm text-muted">
        {summary}
      </p>
    </div>
  );
}
