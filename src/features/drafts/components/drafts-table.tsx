import { Link } from 'react-router';
import type { DraftSummaryDto } from '@shared/schemas/draft-dto';
import { Table, Td, Th } from '@/components/ui/table';
import { DraftStateBadge } from './draft-state-badge';

export interface DraftsTableProps {
  items: DraftSummaryDto[];
  caption: string;
  href: (id: number) => string;
  /** Leave out the client column (on a client's own page). */
  hideClient?: boolean;
}

function dateText(iso: string): string {
  const date = iso.length === 10 ? new Date(`${iso}T12:00:00`) : new Date(iso);
  return date.toLocaleDateString(undefined, { day: 'numeric', month: 'short', year: 'numeric' });
}

/** Drafts with their state, due date and last change; each opens in the workspace. */
export function DraftsTable({ items, caption, href, hideClient = false }: DraftsTableProps) {
  return (
    <Table caption={caption} captionHidden>
      <thead>
        <tr>
          {!hideClient && <Th>Client</Th>}
          <Th>Style</Th>
          <Th>Fabric</Th>
          <Th>State</Th>
          <Th>Due</Th>
          <Th>Last change</Th>
        </tr>
      </thead>
      <tbody>
        {items.map((d) => (
          <tr key={d.id}>
            {!hideClient && (
              <Td className="font-medium">
                <Link to={href(d.id)} className="underline-offset-2 hover:underline">
                  {d.client.name}
                </Link>
              </Td>
            )}
            <Td>
              {hideClient ? (
                <Link to={href(d.id)} className="font-medium underline-offset-2 hover:underline">
                  {d.style.name}
                </Link>
              ) : (
                d.style.name
              )}
              <span className="block text-xs text-muted">revision {d.revision}</span>
            </Td>
            <Td>{d.fabric.name}</Td>
            <Td>
              <DraftStateBadge state={d.state} />
            </Td>
            <Td className="num whitespace-nowrap">{d.dueOn ? dateText(d.dueOn) : <span className="text-muted">none</span>}</Td>
            <Td className="num whitespace-nowrap">{dateText(d.updatedAt)}</Td>
          </tr>
        ))}
      </tbody>
    </Table>
  );
}
