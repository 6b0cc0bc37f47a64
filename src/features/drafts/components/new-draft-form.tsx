import { useState, type FormEvent } from 'react';
import { draftCreateSchema } from '@shared/schemas/draft';
import type { DraftDto } from '@shared/schemas/draft-dto';
import type { LengthUnit } from '@shared/units';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { SelectField } from '@/components/ui/select-field';
import { TextField } from '@/components/ui/text-field';
import { ApiError } from '@/lib/api-client';
import { useBlocks, useBlockToUse } from '../api/get-blocks';
import { useCreateDraft } from '../api/create-draft';
import { useStyles } from '../api/get-styles';
import { BlockChooser, type SetOption } from './block-chooser';

export interface NamedOption {
  id: number;
  name: string;
  /** A short description after the name (e.g. a fabric's stretch). */
  detail?: string;
}

export interface NewDraftFormProps {
  clientId: number | null;
  clients: NamedOption[];
  onClientChange: (id: number | null) => void;
  fabrics: NamedOption[];
  /** The chosen client's measurement sets, to make a block when they have none. */
  measurementSets: SetOption[];
  unit: LengthUnit;
  onCreated: (draft: DraftDto) => void;
}

const FIELD_ORDER = ['clientId', 'blockId', 'styleId', 'fabricId', 'dueOn', 'notes'] as const;

/**
 * Starting a draft: the client, then their block (the one used last, with its corrections,
 * unless another is chosen), a style and a fabric. Creating it opens the workspace.
 */
export function NewDraftForm({ clientId, clients, onClientChange, fabrics, measurementSets, unit, onCreated }: NewDraftFormProps) {
  const blocks = useBlocks(clientId);
  const toUse = useBlockToUse(clientId);
  const styles = useStyles();
  const [blockChoice, setBlockChoice] = useState<{ clientId: number | null; id: string } | null>(null);
  const [styleId, setStyleId] = useState('');
  const [fabricId, setFabricId] = useState('');
  const [dueOn, setDueOn] = useState('');
  const [notes, setNotes] = useState('');
  const [errors, setErrors] = useState<Record<string, string>>({});
  const create = useCreateDraft({ onSuccess: onCreated });

  // The block used last is chosen until the person picks another (for this client).
  const blockId = blockChoice && blockChoice.clientId === clientId ? blockChoice.id : toUse.data?.block ? String(toUse.data.block.id) : '';

  const submit = (e: FormEvent) => {
    e.preventDefault();
    const raw = {
      blockId: blockId ? Number(blockId) : undefined,
      clientId: blockId ? undefined : (clientId ?? undefined),
      styleId: styleId ? Number(styleId) : undefined,
      fabricId: fabricId ? Number(fabricId) : undefined,
      dueOn: dueOn || null,
      notes,
    };
    const parsed = draftCreateSchema(unit).safeParse(raw);
    const out: Record<string, string> = {};
    if (clientId === null) out.clientId = 'Client is required: choose who the garment is for';
    if (!parsed.success) for (const issue of parsed.error.issues) out[String(issue.path[0] ?? 'form')] ??= issue.message;
    if (!blockId && clientId !== null) out.blockId = 'Block is required: make one from a fitting below';
    setErrors(out);
    if (Object.keys(out).length > 0 || !parsed.success) {
      const first = FIELD_ORDER.find((f) => out[f]);
      if (first) document.getElementById(`new-draft-${first}`)?.focus();
      return;
    }
    create.mutate(parsed.data, {
      onError: (error) => {
        if (error instanceof ApiError) setErrors({ ...error.fields, form: error.message });
        else setErrors({ form: 'The draft could not be started. Try again.' });
      },
    });
  };

  return (
    <form onSubmit={submit} noValidate className="grid max-w-2xl gap-5">
      <SelectField
        id="new-draft-clientId"
        label="Client"
        value={clientId === null ? '' : String(clientId)}
        onChange={(e) => onClientChange(e.target.value ? Number(e.target.value) : null)}
        error={errors.clientId}
        options={[{ value: '', label: 'Choose a client' }, ...clients.map((c) => ({ value: String(c.id), label: c.name }))]}
      />
      {clientId !== null && (
        <BlockChooser
          clientId={clientId}
          blocks={blocks.data}
          loading={blocks.isPending || toUse.isPending}
          loadError={blocks.error?.message ?? null}
          usedLastId={toUse.data?.reason === 'last-used' ? (toUse.data.block?.id ?? null) : null}
          value={blockId}
          onChange={(id) => setBlockChoice({ clientId, id })}
          error={errors.blockId}
          measurementSets={measurementSets}
          unit={unit}
        />
      )}
      <SelectField
        id="new-draft-styleId"
        label="Style"
        hint={styles.data?.length === 0 ? 'The studio has no styles yet.' : undefined}
        value={styleId}
        onChange={(e) => setStyleId(e.target.value)}
        error={errors.styleId ?? styles.error?.message}
        options={[
          { value: '', label: styles.isPending ? 'Loading styles…' : 'Choose a style' },
          ...(styles.data ?? []).map((s) => ({ value: String(s.id), label: s.racerBack ? `${s.name} (racer back)` : s.name })),
        ]}
      />
      <SelectField
        id="new-draft-fabricId"
        label="Fabric"
        hint="Its stretch sets the default negative ease."
        value={fabricId}
        onChange={(e) => setFabricId(e.target.value)}
        error={errors.fabricId}
        options={[{ value: '', label: 'Choose a fabric' }, ...fabrics.map((f) => ({ value: String(f.id), label: f.detail ? `${f.name} — ${f.detail}` : f.name }))]}
      />
      <div className="grid gap-5 sm:grid-cols-2">
        <TextField id="new-draft-dueOn" label="Due date" optional type="date" value={dueOn} onChange={(e) => setDueOn(e.target.value)} error={errors.dueOn} />
      </div>
      <TextField id="new-draft-notes" label="Notes" optional value={notes} onChange={(e) => setNotes(e.target.value)} error={errors.notes} />
      {errors.form && <Alert tone="error">{errors.form}</Alert>}
      <div>
        <Button type="submit" variant="primary" pending={create.isPending} pendingLabel="Drafting…">
          Start drafting
        </Button>
      </div>
    </form>
  );
}
