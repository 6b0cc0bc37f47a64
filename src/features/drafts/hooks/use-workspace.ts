/**
 * The drafting workspace's state: parameters with undo and redo, the live draft the engine draws
 * from them on every change, and saving with the version check. A save that meets someone
 * else's newer save (409) keeps both: theirs can be loaded (mine stays one undo away) or mine
 * saved over it as a new revision.
 */
import { useCallback, useMemo, useReducer, useState } from 'react';
import type { DraftDto } from '@shared/schemas/draft-dto';
import type { ParamsMm } from '@shared/schemas/style';
import { ApiError } from '@/lib/api-client';
import { useSaveDraft } from '../api/save-draft';
import { edgeFinishOf, workingValues } from '../lib/live-draft';
import type { NumericParamKey } from '../lib/param-fields';
import { paramsEqual, workspaceInit, workspaceReduce } from '../lib/workspace-state';

export interface SaveConflict {
  /** The draft as it is on the server now. */
  current: DraftDto;
  /** My values that met it. */
  mine: ParamsMm;
}

export function useWorkspace(draft: DraftDto) {
  const [state, dispatch] = useReducer(workspaceReduce, draft, (d) => workspaceInit(d.inputParts, d.params, d.version));
  const [conflict, setConflict] = useState<SaveConflict | null>(null);
  const [saveError, setSaveError] = useState<string | null>(null);
  const save = useSaveDraft();
  const params = state.history.present;
  const parts = state.parts;
  const edgeFinish = edgeFinishOf(parts, params);

  const working = useMemo(() => workingValues(parts, params), [parts, params]);
  const defaults = useMemo(() => workingValues(parts, { edgeFinish }), [parts, edgeFinish]);
  const problems = useMemo(() => {
    const out: Record<string, string> = {};
    if (!state.live.result.ok) for (const e of state.live.result.errors) out[e.path] ??= e.message;
    return out;
  }, [state.live.result]);

  const dirty = !paramsEqual(params, state.saved);
  const valid = state.live.result.ok;

  const setParam = useCallback((key: NumericParamKey, value: number | undefined) => {
    dispatch({ type: 'set', key, value, now: performance.now() });
  }, []);
  const setEdgeFinish = useCallback((value: 'tape' | 'band') => dispatch({ type: 'edge-finish', value, now: performance.now() }), []);
  const commit = useCallback(() => dispatch({ type: 'seal' }), []);
  const undo = useCallback(() => dispatch({ type: 'undo' }), []);
  const redo = useCallback(() => dispatch({ type: 'redo' }), []);

  /** Takes the server's draft as the present (after a reload, restore or reopen); undo goes back to mine. */
  const load = useCallback((next: DraftDto) => {
    dispatch({ type: 'load', parts: next.inputParts, params: next.params, version: next.version, keepHistory: true, now: performance.now() });
  }, []);

  const saveNow = useCallback(
    async (options: { version?: number; params?: ParamsMm } = {}): Promise<DraftDto | null> => {
      const sending = options.params ?? params;
      if (!state.live.result.ok) {
        setSaveError('Not saved: correct the values marked in red first.');
        return null;
      }
      setSaveError(null);
      try {
        const saved = await save.mutateAsync({ id: draft.id, version: options.version ?? state.version, params: sending });
        dispatch({ type: 'saved', params: saved.params, version: saved.version });
        setConflict(null);
        return saved;
      } catch (error) {
        if (error instanceof ApiError && error.status === 409 && isDraftDto(error.current)) {
          setConflict({ current: error.current, mine: sending });
        } else if (error instanceof ApiError) {
          const fields = Object.values(error.fields);
          setSaveError(`Not saved: ${[error.message, ...fields].join(' ')}`);
        } else {
          setSaveError('Not saved: something went wrong. Try again.');
        }
        return null;
      }
    },
    [draft.id, params, save, state.live.result.ok, state.version],
  );

  /** Conflict: take theirs; mine stays one undo away. */
  const conflictReload = useCallback(() => {
    if (!conflict) return;
    load(conflict.current);
    setConflict(null);
  }, [conflict, load]);

  /** Conflict: save mine over theirs as a new revision. */
  const conflictKeepMine = useCallback(async () => {
    if (!conflict) return null;
    dispatch({ type: 'rebase', version: conflict.current.version, saved: conflict.current.params });
    return saveNow({ version: conflict.current.version, params: conflict.mine });
  }, [conflict, saveNow]);

  return {
    state,
    params,
    parts,
    edgeFinish,
    working,
    defaults,
    problems,
    dirty,
    valid,
    canUndo: state.history.past.length > 0,
    canRedo: state.history.future.length > 0,
    setParam,
    setEdgeFinish,
    commit,
    undo,
    redo,
    load,
    save: saveNow,
    saving: save.isPending,
    saveError,
    conflict,
    conflictReload,
    conflictKeepMine,
    conflictDismiss: () => setConflict(null),
  };
}

export type Workspace = ReturnType<typeof useWorkspace>;

function isDraftDto(value: unknown): value is DraftDto {
  return typeof value === 'object' && value !== null && 'inputParts' in value && 'version' in value && 'params' in value;
}
