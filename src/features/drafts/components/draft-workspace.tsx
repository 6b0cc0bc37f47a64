import { useCallback, useState, type ReactNode } from 'react';
import type { DraftState, DraftStateChange } from '@shared/schemas/draft';
import type { Draft } from '@shared/engine';
import type { DraftDto } from '@shared/schemas/draft-dto';
import { ApiError } from '@/lib/api-client';
import { useDisplayUnit } from '@/lib/unit';
import { useMoveDraft } from '../api/move-draft';
import { useRestoreRevision } from '../api/restore-revision';
import { useRevisionView } from '../hooks/use-revision-view';
import { useUnsavedGuard } from '../hooks/use-unsaved-guard';
import { useWorkspace } from '../hooks/use-workspace';
import { useWorkspaceShortcuts } from '../hooks/use-workspace-shortcuts';
import type { EdgeRef } from '../lib/edge-names';
import type { ArrangementMode } from '../lib/piece-arrangement';
import { svgDownload, svgFileName } from '../lib/svg-download';
import { ConflictDialog } from './conflict-dialog';
import { DraftMoveDialog, type FabricOption } from './draft-move-dialog';
import { LeaveDialog } from './leave-dialog';
import { WorkspaceNotices } from './workspace-notices';
import { WorkspaceSides } from './workspace-sides';
import { WorkspaceToolbar } from './workspace-toolbar';

/** What print buttons get to work with: the draft as saved, what is drawn now, and whether it differs. */
export interface PrintContext {
  draft: DraftDto;
  /** The pieces and figures on screen (the current engine's drawing of the values shown). */
  drawn: Draft | null;
  /** True while the values on screen are not saved yet (print what is saved, or save first). */
  unsaved: boolean;
}

export interface DraftWorkspaceProps {
  draft: DraftDto;
  /** The studio's fabrics, for "mark cut" (the fabric used). */
  fabrics: FabricOption[];
  /** Print buttons (the printing feature's dialog), placed in the toolbar's "Print and export" group. */
  printActions?: (context: PrintContext) => ReactNode;
}

function dueText(date: string): string {
  return new Date(`${date}T12:00:00`).toLocaleDateString(undefined, { day: 'numeric', month: 'short', year: 'numeric' });
}

function messageOf(error: unknown): string {
  if (error instanceof ApiError) return [error.message, ...Object.values(error.fields)].join(' ');
  return 'Something went wrong. Try again.';
}

/**
 * The drafting workspace: parameters, the pieces drawn to scale, and the figures, redrawn in the
 * browser on every change; saving, undo and redo, the state moves and the revision history.
 */
export function DraftWorkspace({ draft, fabrics, printActions }: DraftWorkspaceProps) {
  const ws = useWorkspace(draft);
  const unit = useDisplayUnit();
  const [mode, setMode] = useState<ArrangementMode>('side-by-side');
  const [highlight, setHighlight] = useState<EdgeRef | null>(null);
  const [viewing, setViewing] = useState<number | null>(null);
  const [moveTo, setMoveTo] = useState<DraftState | null>(null);
  const [moveError, setMoveError] = useState<string | null>(null);
  const [conflictError, setConflictError] = useState<string | null>(null);
  const move = useMoveDraft();
  const restore = useRestoreRevision();
  const revisionView = useRevisionView(draft.id, viewing);
  const editable = draft.editable && viewing === null;
  const blocker = useUnsavedGuard(ws.dirty && draft.editable);
  const subject = `${draft.client.name} — ${draft.style.name}`;

  const save = useCallback(() => {
    if (draft.editable && ws.dirty && ws.valid && !ws.saving) void ws.save();
  }, [draft.editable, ws]);

  useWorkspaceShortcuts({ onSave: save, onUndo: editable ? ws.undo : undefined, onRedo: editable ? ws.redo : undefined });

  const confirmMove = async (change: DraftStateChange) => {
    setMoveError(null);
    let version = ws.state.version;
    if (change.to === 'approved' && ws.dirty) {
      const saved = await ws.save();
      if (!saved) return setMoveTo(null);
      version = saved.version;
    }
    try {
      const moved = await move.mutateAsync({ id: draft.id, ...change, version });
      ws.load(moved);
      setMoveTo(null);
    } catch (error) {
      setMoveError(messageOf(error));
    }
  };

  const keepMine = async () => {
    const current = ws.conflict?.current;
    if (!current) return;
    setConflictError(null);
    if (current.state !== 'drafting') {
      try {
        const reopened = await move.mutateAsync({ id: draft.id, to: 'drafting', version: current.version, note: 'Reopened to keep a conflicting save' });
        const mine = ws.conflict?.mine ?? ws.params;
        ws.conflictDismiss();
        await ws.save({ version: reopened.version, params: mine });
      } catch (error) {
        setConflictError(messageOf(error));
      }
      return;
    }
    await ws.conflictKeepMine();
  };

  const onRestore = async (rev: number) => {
    try {
      const restored = await restore.mutateAsync({ id: draft.id, rev, version: ws.state.version });
      ws.load(restored);
      setViewing(null);
    } catch (error) {
      setMoveError(messageOf(error));
    }
  };

  const shownDraft = viewing !== null ? revisionView.draft : ws.state.good;
  const downloadable = shownDraft;

  return (
    <div className="flex flex-col gap-3 lg:h-[calc(100dvh-7.5rem)] lg:min-h-[600px]">
      <WorkspaceToolbar
        title={draft.client.name}
        subtitle={`${draft.style.name} · ${draft.fabric.name} · block ${draft.block.name || `measured ${draft.block.measuredOn ?? ''}`}${draft.dueOn ? ` · due ${dueText(draft.dueOn)}` : ''}`}
        state={draft.state}
        revision={draft.revision}
        editable={editable}
        dirty={ws.dirty}
        valid={ws.valid}
        saving={ws.saving}
        saveError={ws.saveError}
        canUndo={ws.canUndo}
        canRedo={ws.canRedo}
        onUndo={ws.undo}
        onRedo={ws.redo}
        onSave={save}
        moves={viewing === null ? draft.allowedMoves : []}
        onMove={(to) => {
          setMoveError(null);
          setMoveTo(to);
        }}
        onDownloadSvg={downloadable ? () => svgDownload(downloadable, subject, svgFileName([draft.client.name, draft.style.name], draft.revision)) : null}
        printSlot={printActions?.({ draft, drawn: shownDraft, unsaved: ws.dirty })}
      />
      <WorkspaceNotices draft={draft} viewing={viewing} revisionView={revisionView} onBack={() => setViewing(null)} restoreError={moveTo === null ? moveError : null} />
      <WorkspaceSides
        draft={draft}
        ws={ws}
        unit={unit}
        editable={editable}
        shownDraft={shownDraft}
        viewing={viewing}
        viewedParams={revisionView.revision?.snapshot.params ?? null}
        onView={setViewing}
        onRestore={(rev) => void onRestore(rev)}
        restoring={restore.isPending ? (restore.variables?.rev ?? null) : null}
        mode={mode}
        onModeChange={setMode}
        highlight={highlight}
        onHighlight={setHighlight}
      />
      <DraftMoveDialog
        key={`${moveTo ?? 'closed'}-${draft.version}`}
        to={moveTo}
        version={ws.state.version}
        subject={subject}
        fabrics={fabrics}
        defaultFabricId={draft.fabric.id}
        pending={move.isPending || ws.saving}
        error={moveError}
        onConfirm={(change) => void confirmMove(change)}
        onCancel={() => setMoveTo(null)}
      />
      <ConflictDialog
        current={ws.conflict?.current ?? null}
        pending={ws.saving || move.isPending}
        error={conflictError}
        onReload={ws.conflictReload}
        onKeepMine={() => void keepMine()}
        onCancel={ws.conflictDismiss}
      />
      <LeaveDialog blocker={blocker} onSave={ws.save} />
    </div>
  );
}
