/**
 * The workspace's editing state as a pure reducer: the parameter history, the live draft drawn
 * from its present, the last draft that drafted cleanly (kept on screen while a value is
 * inconsistent), and the saved values and version the next save builds on.
 */
import type { Draft } from '@shared/engine';
import type { DraftInputParts } from '@shared/schemas/draft-input-build';
import type { ParamsMm } from '@shared/schemas/style';
import { historyCreate, historyPush, historyRedo, historySeal, historyUndo, type History } from './history';
import { liveDraftRun, type LiveDraft } from './live-draft';
import type { NumericParamKey } from './param-fields';

export interface WorkspaceState {
  parts: DraftInputParts;
  history: History<ParamsMm>;
  live: LiveDraft;
  /** The newest draft that drafted without errors (null only if none ever did). */
  good: Draft | null;
  /** What the server holds: a save is needed while the present differs. */
  saved: ParamsMm;
  /** The draft's version the next save sends. */
  version: number;
}

export type WorkspaceAction =
  | { type: 'set'; key: NumericParamKey; value: number | undefined; now: number }
  | { type: 'edge-finish'; value: 'tape' | 'band'; now: number }
  | { type: 'seal' }
  | { type: 'undo' }
  | { type: 'redo' }
  /** The server's draft after our own save: the present stays, the baseline moves. */
  | { type: 'saved'; params: ParamsMm; version: number }
  /** Load the server's draft (first load, reload after a conflict, restore, reopen); undo can go back. */
  | { type: 'load'; parts: DraftInputParts; params: ParamsMm; version: number; keepHistory: boolean; now: number }
  /** Only the version moves (e.g. keep mine after a conflict: save again over theirs). */
  | { type: 'rebase'; version: number; saved: ParamsMm };

function withLive(state: WorkspaceState, history: History<ParamsMm>, parts = state.parts): WorkspaceState {
  if (history === state.history && parts === state.parts) return state;
  const live = liveDraftRun(parts, history.present);
  return { ...state, parts, history, live, good: live.result.ok ? live.result.draft : state.good };
}

export function workspaceInit(parts: DraftInputParts, params: ParamsMm, version: number): WorkspaceState {
  const live = liveDraftRun(parts, params);
  return { parts, history: historyCreate(params), live, good: live.result.ok ? live.result.draft : null, saved: params, version };
}

function paramSet(params: ParamsMm, key: keyof ParamsMm, value: ParamsMm[keyof ParamsMm] | undefined): ParamsMm {
  const next: Record<string, unknown> = { ...params };
  if (value === undefined) delete next[key];
  else next[key] = value;
  return next as ParamsMm;
}

export function workspaceReduce(state: WorkspaceState, action: WorkspaceAction): WorkspaceState {
  switch (action.type) {
    case 'set': {
      const present = state.history.present;
      if (present[action.key] === action.value) return state;
      return withLive(state, historyPush(state.history, paramSet(present, action.key, action.value), action.key, action.now));
    }
    case 'edge-finish': {
      const present = state.history.present;
      if (present.edgeFinish === action.value) return state;
      return withLive(state, historyPush(state.history, paramSet(present, 'edgeFinish', action.value), 'edgeFinish', action.now));
    }
    case 'seal':
      return { ...state, history: historySeal(state.history) };
    case 'undo':
      return withLive(state, historyUndo(state.history));
    case 'redo':
      return withLive(state, historyRedo(state.history));
    case 'saved':
      return { ...state, saved: action.params, version: action.version };
    case 'load': {
      const history = action.keepHistory
        ? historySeal(historyPush(historySeal(state.history), action.params, '__load', action.now))
        : historyCreate(action.params);
      return { ...withLive(state, history, action.parts), saved: action.params, version: action.version };
    }
    case 'rebase':
      return { ...state, version: action.version, saved: action.saved };
  }
}

/** True when two parameter sets hold the same values (key order and absent keys aside). */
export function paramsEqual(a: ParamsMm, b: ParamsMm): boolean {
  const keys = new Set([...Object.keys(a), ...Object.keys(b)]) as Set<keyof ParamsMm>;
  for (const key of keys) {
    const x = a[key];
    const y = b[key];
    if (typeof x === 'number' && typeof y === 'number') {
      // Saved values come back through the database: a micrometre is the same value.
      if (Math.abs(x - y) > 1e-6) return false;
    } else if (x !== y) return false;
  }
  return true;
}
