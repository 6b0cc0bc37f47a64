import type { ReactNode } from 'react';
import type { QueueItemDto } from '@shared/schemas/draft-dto';
import { lengthFormat, type LengthUnit } from '@shared/units';
import { Button, ButtonLink } from '@/components/ui/button';
import { Table, Td, Th } from '@/components/ui/table';
import type { QueueState } from '../api/queue-keys';

export interface QueueTableProps {
  items: QueueItemDto[];
  state: QueueState;
  unit: LengthUnit;
  /** Link to open a draft (read-only for cutters). */
  openHref: (id: number) => string;
  /** The move this list leads to ("Mark cut…"), or null when the caller may not make it. */
  actionLabel: string | null;
  onAction: (item: QueueItemDto) => void;
  /** Today, "YYYY-MM-DD", to flag overdue items. */
  today: string;
  /** More buttons for a row (the printing feature's "Print…"), placed after "Open". */
  rowActions?: (item: QueueItemDto) => ReactNode;
}

const SINCE_LABELS: Record<QueueState, string> = { approved: 'Approved', cut: 'Cut', sewn: 'Sewn' };

const FOLD_WORDS = { 'four-layers': 'in four', 'two-layers': 'in two', 'does-not-fit': 'does not fit' } as const;

function dateText(iso: string): string {
  const date = iso.length === 10 ? new Date(`${iso}T12:00:00`) : new Date(iso);
  return date.toLocaleDateString(undefined, { day: 'numeric', month: 'short', year: 'numeric' });
}

/** Drafts waiting in one state, oldest first as the server sends them. */
export function QueueTable({ items, state, unit, openHref, actionLabel, onAction, today, rowActions }: QueueTableProps) {
  return (
    <Table caption={`${items.length} ${items.length === 1 ? 'draft' : 'drafts'}, oldest first`} captionHidden>
      <thead>
        <tr>
          <Th>Client</Th>
          <Th>Style</Th>
          <Th>Fabric</Th>
          <Th>Due</Th>
          <Th>{SINCE_LABELS[state]}</Th>
          <Th className="text-right">Fabric needed</Th>
          <Th>
            <span className="sr-only">Actions</span>
          </Th>
        </tr>
      </thead>
      <tbody>
        {items.map((item) => {
          const overdue = item.dueOn !== null && item.dueOn < today;
          return (
            <tr key={item.id} data-testid={`queue-row-${item.id}`}>
              <Td className="font-medium">{item.client.name}</Td>
              <Td>
                {item.style.name}
                <span className="block text-xs text-muted">revision {item.revision}</span>
              </Td>
              <Td>{item.fabric.name}</Td>
              <Td className="num whitespace-nowrap">
                {item.dueOn ? dateText(item.dueOn) : <span className="text-muted">none</span>}
                {overdue && <span className="block text-xs font-semibold text-danger">overdue</span>}
              </Td>
              <Td className="num whitespace-nowrap">{dateText(item.since)}</Td>
              <Td className="num text-right whitespace-nowrap">
                {lengthFormat(item.lengthNeeded, unit)}
                <span className="block text-xs text-muted">folded {FOLD_WORDS[item.fold]}</span>
                {item.warnings > 0 && (
                  <span className="block text-xs font-medium text-warn">
                    {item.warnings} {item.warnings === 1 ? 'warning' : 'warnings'}
                  </span>
                )}
              </Td>
              <Td>
                <div className="flex justify-end gap-2">
                  <ButtonLink compact to={openHref(item.id)} aria-label={`Open ${item.client.name}, ${item.style.name}`}>
                    Open
                  </ButtonLink>
                  {rowActions?.(item)}
                  {actionLabel && (
                    <Button compact onClick={() => onAction(item)} aria-label={`${actionLabel} ${item.client.name}, ${item.style.name}`}>
                      {actionLabel}
                    </Button>
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
