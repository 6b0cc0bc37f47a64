import type { ClientView } from '@shared/schemas/client';
import { Dialog } from '@/components/ui/dialog';
import { useCreateClient } from '../api/create-client';
import { ClientForm } from './client-form';

interface ClientCreateDialogProps {
  open: boolean;
  onClose: () => void;
  onCreated: (client: ClientView) => void;
}

/** A new client: name first, contact and notes if the owner has them. */
export function ClientCreateDialog({ open, onClose, onCreated }: ClientCreateDialogProps) {
  const create = useCreateClient({ onSuccess: onCreated });
  return (
    <Dialog open={open} onClose={onClose} title="Add a client" description="Only the name is needed now; measurements are taken at the fitting.">
      <ClientForm submitLabel="Add client" pendingLabel="Adding…" onSubmit={(values) => create.mutateAsync(values)} onCancel={onClose} />
    </Dialog>
  );
}
