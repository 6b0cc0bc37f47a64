import { useState } from 'react';
import { CORRECTION_TARGETS, type BlockDto, type CorrectionDto } from '@shared/schemas/block';
import { lengthFormat, type LengthUnit } from '@shared/units';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { LoadingState } from '@/components/ui/loading-state';
import { SelectField } from '@/components/ui/select-field';
import { useCreateBlock } from '../api/create-block';
import { percentText } from '../lib/figures';

export interface SetOption {
  id: number;
  label: string;
}

export interface BlockChooserProps {
  clientId: number;
  blocks: BlockDto[] | undefined;
  loading: boolean;
  loadError: string | null;
  usedLastId: number | null;
  value: string;
  onChange: (id: string) => void;
  error?: string;
  measurementSets: SetOption[];
  unit: LengthUnit;
}

function blockLabel(b: BlockDto, usedLastId: number | null): string {
  const name = b.name || 'Block';
  const measured = b.measuredOn ? `measured ${b.measuredOn}` : 'measured';
  const fixes = b.corrections.length === 1 ? '1 correction' : `${b.corrections.length} corrections`;
  return `${name} · ${measured} · ${fixes}${b.id === usedLastId ? ' · used last' : ''}`;
}

/** "+1 cm at hip", "Bust ease −2 %", in the studio's unit. */
export function correctionText(c: CorrectionDto, unit: LengthUnit): string {
  const target = CORRECTION_TARGETS[c.target];
  const amount = target.kind === 'length' ? `${c.amount > 0 ? '+' : '−'}${lengthFormat(Math.abs(c.amount), unit)}` : percentText(c.amount);
  return `${target.label} ${amount}`;
}

/** The client's block to draft from, its fit corrections, or the way to make one from a fitting. */
export function BlockChooser({ clientId, blocks, loading, loadError, usedLastId, value, onChange, error, measurementSets, unit }: BlockChooserProps) {
  const [setId, setSetId] = useState('');
  const create = useCreateBlock({ onSuccess: (block) => onChange(String(block.id)) });
  if (loading) return <LoadingState>Loading the client’s blocks…</LoadingState>;
  if (loadError) return <Alert tone="error">{loadError}</Alert>;
  const chosen = blocks?.find((b) => String(b.id) === value);
  if (!blocks || blocks.length === 0) {
    return (
      <fieldset className="rounded-xl border border-line bg-panel p-4">
        <legend className="px-1 text-sm font-medium">Block</legend>
        <p className="text-sm text-muted">
          This client has no block yet. Make one from a fitting: the block keeps that measurement set and any fit corrections found later.
        </p>
        {measurementSets.length === 0 ? (
          <p className="mt-2 text-sm font-medium text-ink">Take their measurements first (bust, hip and armhole depth).</p>
        ) : (
          <div className="mt-3 flex flex-wrap items-end gap-3">
            <SelectField
              id="new-draft-blockId"
              label="Fitting"
              className="min-w-64 flex-1"
              value={setId}
              onChange={(e) => setSetId(e.target.value)}
              error={error}
              options={[{ value: '', label: 'Choose a fitting' }, ...measurementSets.map((s) => ({ value: String(s.id), label: s.label }))]}
            />
            <Button
              pending={create.isPending}
              disabled={!setId}
              onClick={() => create.mutate({ clientId, measurementSetId: Number(setId), name: 'Fitted block' })}
            >
              Make block
            </Button>
          </div>
        )}
        {create.isError && <Alert tone="error" className="mt-3">{create.error.message}</Alert>}
      </fieldset>
    );
  }
  return (
    <div>
      <SelectField
        id="new-draft-blockId"
        label="Block"
        hint={usedLastId ? 'The block used last is chosen, with its corrections.' : 'The newest block is chosen.'}
        value={value}
        onChange={(e) => onChange(e.target.value)}
        error={error}
        options={blocks.map((b) => ({ value: String(b.id), label: blockLabel(b, usedLastId) }))}
      />
      {chosen && chosen.corrections.length > 0 && (
        <ul className="mt-2 space-y-1 text-sm" aria-label="Fit corrections of this block" data-testid="block-corrections">
          {chosen.corrections.map((c) => (
            <li key={c.id} className="num">
              <span className="font-medium">{correctionText(c, unit)}</span>
              <span className="text-muted">
                {' '}
                — {c.note} ({c.notedOn})
              </span>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
