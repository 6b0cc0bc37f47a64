import { useMemo } from 'react';
import { Link } from 'react-router';
import { flexRender, getCoreRowModel, useReactTable, type ColumnDef, type SortingState } from '@tanstack/react-table';
import type { ClientView } from '@shared/schemas/client';
import { Badge } from '@/components/ui/badge';
import { Table, Td, Th } from '@/components/ui/table';
import { cx } from '@/components/ui/cx';
import type { ClientListParams, ClientSort } from '../lib/list-params';
import { dateFormat } from '@/lib/dates';

interface ClientsTableProps {
  rows: ClientView[];
  params: ClientListParams;
  /** Owners see how to reach a client; cutters do not. */
  showContact: boolean;
  clientHref: (id: number) => string;
  onSortChange: (sort: ClientSort, order: 'asc' | 'desc') => void;
  /** Rows from an earlier query are still on screen while the next one loads. */
  stale?: boolean;
}

const SORTABLE = new Set<string>(['name', 'lastTakenAt', 'updatedAt']);

/** One page of clients, sorted by the server: column headers are the sort buttons. */
export function ClientsTable({ rows, params, showContact, clientHref, onSortChange, stale }: ClientsTableProps) {
  const columns = useMemo<ColumnDef<ClientView>[]>(() => {
    const list: ColumnDef<ClientView>[] = [
      {
        id: 'name',
        header: 'Name',
        cell: ({ row }) => (
          <Link to={clientHref(row.original.id)} className="inline-flex min-h-touch items-center font-semibold text-ink underline-offset-4 hover:underline">
            {row.original.name}
          </Link>
        ),
      },
    ];
    if (showContact) {
      list.push({ id: 'email', header: 'E-mail', cell: ({ row }) => row.original.email ?? <span className="text-muted">—</span> });
      list.push({ id: 'phone', header: 'Phone', cell: ({ row }) => <span className="num">{row.original.phone ?? '—'}</span> });
    }
    list.push(
      {
        id: 'lastTakenAt',
        header: 'Last fitting',
        cell: ({ row }) =>
          row.original.lastTakenAt ? <span className="num">{dateFormat(row.original.lastTakenAt)}</span> : <span className="text-muted">Not measured yet</span>,
      },
      {
        id: 'measurementSetCount',
        header: 'Fittings',
        cell: ({ row }) => <span className="num">{row.original.measurementSetCount}</span>,
      },
      {
        id: 'updatedAt',
        header: 'Updated',
        cell: ({ row }) => <span className="num text-muted">{dateFormat(row.original.updatedAt)}</span>,
      },
    );
    if (params.status !== 'active') {
      list.push({
        id: 'status',
        header: 'Status',
        cell: ({ row }) => (row.original.archived ? <Badge>Archived</Badge> : <Badge tone="accent">Active</Badge>),
      });
    }
    return list;
  }, [showContact, clientHref, params.status]);

  const sorting: SortingState = [{ id: params.sort, desc: params.order === 'desc' }];
  // TanStack Table hands back fresh functions each render; nothing below memoizes them.
  // eslint-disable-next-line react-hooks/incompatible-library
  const table = useReactTable({
    data: rows,
    columns,
    state: { sorting },
    manualSorting: true,
    manualPagination: true,
    getCoreRowModel: getCoreRowModel(),
    getRowId: (row) => String(row.id),
  });

  return (
    <Table caption="Clients" captionHidden className={cx('bg-panel transition-opacity', stale && 'opacity-60')}>
      <thead>
        {table.getHeaderGroups().map((group) => (
          <tr key={group.id}>
            {group.headers.map((header) => {
              const id = header.column.id;
              const label = flexRender(header.column.columnDef.header, header.getContext());
              if (!SORTABLE.has(id)) return <Th key={header.id}>{label}</Th>;
              const active = params.sort === id;
              const next: 'asc' | 'desc' = active && params.order === 'asc' ? 'desc' : 'asc';
              return (
                <Th key={header.id} aria-sort={active ? (params.order === 'asc' ? 'ascending' : 'descending') : 'none'} className="p-0">
                  <button
                    type="button"
                    onClick={() => onSortChange(id as ClientSort, next)}
                    className="flex min-h-touch w-full items-center gap-1.5 px-4 text-left font-semibold hover:bg-line/40"
                  >
                    {label}
                    <SortMark state={active ? params.order : null} />
                  </button>
                </Th>
              );
            })}
          </tr>
        ))}
      </thead>
      <tbody>
        {table.getRowModel().rows.map((row) => (
          <tr key={row.id} className="hover:bg-surface/60">
            {row.getVisibleCells().map((cell) => (
              <Td key={cell.id}>{flexRender(cell.column.columnDef.cell, cell.getContext())}</Td>
            ))}
          </tr>
        ))}
      </tbody>
    </Table>
  );
}

function SortMark({ state }: { state: 'asc' | 'desc' | null }) {
  return (
    <svg aria-hidden viewBox="0 0 12 16" className={cx('h-4 w-3', state ? 'text-ink' : 'text-line')} fill="currentColor">
      <path d="M6 1 10.5 6.5h-9z" opacity={state === 'desc' ? 0.25 : 1} />
      <path d="M6 15 1.5 9.5h9z" opacity={state === 'asc' ? 0.25 : 1} />
    </svg>
  );
}
