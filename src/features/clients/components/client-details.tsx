import { useState } from 'react';
import type { ClientCreate, ClientView } from '@shared/schemas/client';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { clientConflictCurrent, useUpdateClient } from '../api/update-client';
import { ClientConflict } from './client-conflict';
import { ClientForm, type ClientFormValues } from './client-form';

interface ClientDetailsProps {
  client: ClientView;
  canEdit: boolean;
  /** Owners see how to reach the client; cutters do not (the server leaves it out for them too). */
  showContact: boolean;
}

function formValues(client: ClientView): ClientFormValues {
  return { name: client.name, email: client.email ?? '', phone: client.phone ?? '', notes: client.notes ?? '' };
}

function body(values: ClientCreate, showContact: boolean) {
  return showContact ? values : { name: values.name, notes: values.notes };
}

/** Contact and notes, read or edited in place; a stale save shows both copies. */
export function ClientDetails({ client, canEdit, showContact }: ClientDetailsProps) {
  const [editing, setEditing] = useState(false);
  // The version the edit started from: a save from an older one is refused with 409.
  const [baseVersion, setBaseVersion] = useState(client.version);
  const [conflict, setConflict] = useState<{ mine: ClientCreate; current: ClientView } | null>(null);
  const [resetTo, setResetTo] = useState<ClientFormValues | null>(null);
  const update = useUpdateClient(client.id, {
    onSuccess: () => {
      setEditing(false);
      setConflict(null);
    },
  });

  const save = async (values: ClientCreate, version: number) => {
    try {
      await update.mutateAsync({ ...body(values, showContact), version });
    } catch (error) {
      const current = clientConflictCurrent(error);
      if (!current) throw error;
      setConflict({ mine: values, current });
    }
  };

  if (!editing) {
    return (
      <Card
        title="Details"
        actions={
          canEdit && (
            <Button
              compact
              onClick={() => {
                setBaseVersion(client.version);
                setResetTo(null);
                setEditing(true);
              }}
            >
              Edit details
            </Button>
          )
        }
      >
        <dl className="grid gap-4 sm:grid-cols-2">
          {showContact && (
            <>
              <Item label="E-mail" value={client.email} empty="No e-mail" />
              <Item label="Phone" value={client.phone} empty="No phone" numeric />
            </>
          )}
          <Item label="Notes" value={client.notes} empty="No notes yet" wide />
        </dl>
      </Card>
    );
  }

  return (
    <Card title="Edit details">
      {conflict && (
        <div className="mb-5">
          <ClientConflict
            mine={{
              name: conflict.mine.name,
              email: conflict.mine.email ?? '',
              phone: conflict.mine.phone ?? '',
              notes: conflict.mine.notes ?? '',
            }}
            current={conflict.current}
            showContact={showContact}
            pending={update.isPending}
            onKeepMine={() => void save(conflict.mine, conflict.current.version).catch(() => undefined)}
            onTakeTheirs={() => {
              setBaseVersion(conflict.current.version);
              setResetTo(formValues(conflict.current));
              setConflict(null);
            }}
          />
          {update.error && !clientConflictCurrent(update.error) && (
            <Alert tone="error" title="Not saved" className="mt-3">
              {update.error.message}
            </Alert>
          )}
        </div>
      )}
      <ClientForm
        defaultValues={formValues(client)}
        resetTo={resetTo}
        showContact={showContact}
        submitLabel="Save details"
        pendingLabel="Saving…"
        onSubmit={(values) => save(values, baseVersion)}
        onCancel={() => {
          setEditing(false);
          setConflict(null);
        }}
      />
    </Card>
  );
}

function Item({
  label,
  value,
  empty,
  numeric,
  wide,
}: {
  label: string;
  value: string | null | undefined;
  empty: string;
  numeric?: boolean;
  wide?: boolean;
}) {
  return (
    <div className={wide ? 'sm:col-span-2' : undefined}>
      <dt className="text-sm font-medium text-muted">{label}</dt>
      <dd className={`mt-1 whitespace-pre-wrap ${numeric ? 'num' : ''} ${value ? 'text-ink' : 'text-muted'}`}>
        {value || empty}
      </dd>
    </div>
  );
}
