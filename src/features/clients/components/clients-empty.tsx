import type { ReactNode } from 'react';
import type { ClientStatus } from '../lib/list-params';

interface ClientsEmptyProps {
  search: string;
  status: ClientStatus;
  canEdit: boolean;
  /** The "Add client" button, for owners. */
  addAction: ReactNode;
  onSearchClear: () => void;
}

/** What to do when the list is empty: add the first client, or change the search. */
export function ClientsEmpty({ search, status, canEdit, addAction, onSearchClear }: ClientsEmptyProps) {
  let title: string;
  let text: ReactNode;
  let action: ReactNode = null;
  if (search.trim()) {
    title = `No client matches “${search.trim()}”`;
    text = 'Check the spelling, search by part of the name or by e-mail, or look among archived clients.';
    action = (
      <button type="button" onClick={onSearchClear} className="min-h-touch rounded-lg border border-line bg-panel px-5 font-medium hover:bg-surface">
        Clear the search
      </button>
    );
  } else if (status === 'archived') {
    title = 'No archived clients';
    text = 'Clients you archive from their page are kept here with all their measurements.';
  } else {
    title = 'No clients yet';
    text = canEdit
      ? 'Add your first client, then take their measurements at the fitting.'
      : 'An owner of the studio adds clients; they will appear here with their measurements.';
    action = canEdit ? addAction : null;
  }
  return (
    <div className="rounded-xl border border-dashed border-line bg-panel px-6 py-12 text-center" data-testid="clients-empty">
      <h2 className="text-lg font-semibold">{title}</h2>
      <p className="mx-auto mt-2 max-w-md text-muted">{text}</p>
      {action && <div className="mt-6 flex justify-center">{action}</div>}
    </div>
  );
}
