import type { ReactNode } from 'react';
import type { DraftState } from '@shared/schemas/draft';
import { Button } from '@/components/ui/button';
import { cx } from '@/components/ui/cx';
import { MOVE_LABELS } from '../lib/draft-states';
import { DraftStateBadge } from './draft-state-badge';

export interface WorkspaceToolbarProps {
  title: string;
  subtitle: string;
  state: DraftState;
  revision: number;
  editable: boolean;
  dirty: boolean;
  valid: boolean;
  saving: boolean;
  saveError: string | null;
  canUndo: boolean;
  canRedo: boolean;
  onUndo: () => void;
  onRedo: () => void;
  onSave: () => void;
  /** Moves the caller may make now (from the server), in order. */
  moves: DraftState[];
  onMove: (to: DraftState) => void;
  onDownloadSvg: (() => void) | null;
  /** Print buttons (the printing feature's dialog) go here, beside the SVG download. */
  printSlot?: ReactNode;
}

function status({ saving, saveError, valid, dirty, editable, revision }: WorkspaceToolbarProps): {
  text: string;
  tone: 'muted' | 'danger' | 'ink';
} {
  if (saving) return { text: 'Saving…', tone: 'muted' };
  if (saveError) return { text: saveError, tone: 'danger' };
  if (!editable) return { text: `Revision ${revision} · read-only`, tone: 'muted' };
  if (!valid)
    return {
      text: 'Cannot save: correct the values marked in red',
      tone: 'danger',
    };
  if (dirty) return { text: 'Unsaved changes', tone: 'ink' };
  return { text: `Saved · revision ${revision}`, tone: 'muted' };
}

const kbd = typeof navigator !== 'undefined' && /Mac|iPad|iPhone/.test(navigator.platform) ? '⌘' : 'Ctrl+';

/** The workspace's title and actions: undo, redo, save, the state moves, and printing. */
export function WorkspaceToolbar(props: WorkspaceToolbarProps) {
  const {
    title,
    subtitle,
    state,
    editable,
    dirty,
    valid,
    saving,
    canUndo,
    canRedo,
    onUndo,
    onRedo,
    onSave,
    moves,
    onMove,
    onDownloadSvg,
    printSlot,
  } = props;
  const shown = status(props);
  const forward = moves.filter((m) => m !== 'drafting');
  return (
    <div className="flex flex-wrap items-center gap-x-4 gap-y-2">
      <div className="min-w-0 flex-1">
        <div className="flex flex-wrap items-center gap-2">
          <h1 className="truncate text-xl font-semibold tracking-tight">{title}</h1>
          <DraftStateBadge state={state} />
        </div>
        <p className="text-sm text-muted">{subtitle}</p>
      </div>
      <div className="flex flex-wrap items-center gap-x-3 gap-y-2" role="toolbar" aria-label="Draft actions">
        {editable && (
          <div className="flex gap-1" role="group" aria-label="History">
            <Button
              compact
              variant="ghost"
              disabled={!canUndo}
              onClick={onUndo}
              title={`Undo (${kbd}Z)`}
              aria-keyshortcuts="Control+Z Meta+Z"
            >
              Undo
            </Button>
            <Button
              compact
              variant="ghost"
              disabled={!canRedo}
              onClick={onRedo}
              title={`Redo (${kbd}Shift+Z)`}
              aria-keyshortcuts="Control+Shift+Z Meta+Shift+Z"
            >
              Redo
            </Button>
          </div>
        )}
        <p
          role="status"
          aria-live="polite"
          data-testid="save-status"
          className={cx(
            'max-w-[18rem] text-sm',
            shown.tone === 'danger' ? 'font-medium text-danger' : shown.tone === 'ink' ? 'font-medium text-ink' : 'text-muted',
          )}
        >
          {shown.text}
        </p>
        {editable && (
          <Button
            variant={dirty ? 'primary' : 'secondary'}
            onClick={onSave}
            disabled={!dirty || !valid}
            pending={saving}
            pendingLabel="Saving…"
            title={`Save (${kbd}S)`}
            aria-keyshortcuts="Control+S Meta+S"
          >
            Save
          </Button>
        )}
        {moves.includes('drafting') && (
          <Button onClick={() => onMove('drafting')} disabled={saving}>
            {MOVE_LABELS.drafting}
          </Button>
        )}
        {forward.map((m) => (
          <Button
            key={m}
            variant={m === 'approved' && !dirty ? 'primary' : 'secondary'}
            onClick={() => onMove(m)}
            disabled={saving || (m === 'approved' && !valid)}
          >
            {m === 'approved' && dirty ? 'Save and approve…' : `${MOVE_LABELS[m]}…`}
          </Button>
        ))}
        <div className="flex gap-1 border-l border-line pl-3" role="group" aria-label="Print and export">
          {printSlot}
          <Button compact onClick={onDownloadSvg ?? undefined} disabled={!onDownloadSvg}>
            Download SVG
          </Button>
        </div>
      </div>
    </div>
  );
}
