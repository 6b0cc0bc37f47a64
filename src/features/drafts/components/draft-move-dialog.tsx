import { useState, type FormEvent } from 'react';
import { draftStateSchema, type DraftState, type DraftStateChange } from '@shared/schemas/draft';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { controlClasses, Field } from '@/components/ui/field';
import { SelectField } from '@/components/ui/select-field';
import { MOVE_DESCRIPTIONS, MOVE_LABELS } from '../lib/draft-states';

export interface FabricOption {
  id: number;
  name: string;
}

export interface DraftMoveDialogProps {
  /** The state to move to, or null when closed. */
  to: DraftState | null;
  version: number;
  /** What the draft is, for the title ("Mina Okafor — Scoop tank"). */
  subject: string;
  /** For "cut": the studio's fabrics, and the draft's own fabric preselected. */
  fabrics?: FabricOption[];
  defaultFabricId?: number;
  pending: boolean;
  error?: string | null;
  onConfirm: (change: DraftStateChange) => void;
  onCancel: () => void;
}

/**
 * Moves a draft on (approve, reopen, cut, sewn, delivered) with an optional note, and the fabric
 * used when marking it cut. The same schema the server uses checks the form.
 */
export function DraftMoveDialog({ to, version, subject, fabrics = [], defaultFabricId, pending, error, onConfirm, onCancel }: DraftMoveDialogProps) {
  const [note, setNote] = useState('');
  const [fabricId, setFabricId] = useState<string>(defaultFabricId ? String(defaultFabricId) : '');
  const [fieldErrors, setFieldErrors] = useState<Record<string, string>>({});
  const open = to !== null;

  const submit = (e: FormEvent) => {
    e.preventDefault();
    if (!to) return;
    const raw = to === 'cut' ? { to, version, fabricId: fabricId === '' ? undefined : Number(fabricId), note } : { to, version, note };
    const parsed = draftStateSchema.safeParse(raw);
    if (!parsed.success) {
      const out: Record<string, string> = {};
      for (const issue of parsed.error.issues) out[String(issue.path[0] ?? 'form')] ??= issue.message;
      setFieldErrors(out);
      return;
    }
    setFieldErrors({});
    onConfirm(parsed.data);
  };

  return (
    <Dialog
      open={open}
      onClose={() => !pending && onCancel()}
      title={to ? `${MOVE_LABELS[to]}: ${subject}` : ''}
      description={to ? MOVE_DESCRIPTIONS[to] : undefined}
    >
      {to && (
        <form onSubmit={submit} className="space-y-4" noValidate>
          {to === 'cut' && (
            <SelectField
              label="Fabric used"
              value={fabricId}
              onChange={(e) => setFabricId(e.target.value)}
              error={fieldErrors.fabricId}
              options={[{ value: '', label: 'Choose the fabric that was cut' }, ...fabrics.map((f) => ({ value: String(f.id), label: f.name }))]}
            />
          )}
          {to === 'cut' && (
            <Alert tone="warn" title="Cutting safely">
              Close the rotary cutter’s guard after every cut, cut away from your body and replace dull blades. Follow your studio’s own safety
              rules.
            </Alert>
          )}
          <Field label="Note" optional error={fieldErrors.note}>
            {(ids) => (
              <textarea
                id={ids.id}
                aria-describedby={ids.describedBy}
                aria-invalid={ids.invalid || undefined}
                rows={3}
                value={note}
                onChange={(e) => setNote(e.target.value)}
                className={`${controlClasses(ids.invalid)} py-2`}
                placeholder={to === 'cut' ? 'e.g. cut from the second roll, 1.2 m left' : ''}
              />
            )}
          </Field>
          {error && <Alert tone="error">{error}</Alert>}
          <div className="flex flex-wrap justify-end gap-3">
            <Button onClick={onCancel} disabled={pending}>
              Cancel
            </Button>
            <Button type="submit" variant="primary" pending={pending}>
              {MOVE_LABELS[to]}
            </Button>
          </div>
        </form>
      )}
    </Dialog>
  );
}
