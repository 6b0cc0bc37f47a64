/**
 * Undo and redo for the workspace's parameters. A slider drag or a held arrow key changes one
 * field many times a second; those changes merge into one step so that one undo takes the
 * whole drag back, not one pixel of it.
 */

export interface History<T> {
  past: T[];
  present: T;
  future: T[];
  /** The field the last change touched, and when (ms), to merge a drag into one step. */
  lastField: string | null;
  lastAt: number;
}

/** Changes to the same field closer together than this merge into one undo step. */
export const HISTORY_MERGE_MS = 1000;

/** Most undo steps kept; older ones are dropped. */
export const HISTORY_LIMIT = 200;

export function historyCreate<T>(present: T): History<T> {
  return { past: [], present, future: [], lastField: null, lastAt: 0 };
}

/**
 * Records a change of `field` to `next` at time `now` (ms). A change of the same field within
 * {@link HISTORY_MERGE_MS} of the last replaces the present instead of adding a step.
 */
export function historyPush<T>(history: History<T>, next: T, field: string, now: number): History<T> {
  if (Object.is(next, history.present)) return history;
  const merge = history.lastField === field && now - history.lastAt < HISTORY_MERGE_MS && history.past.length > 0;
  const past = merge ? history.past : [...history.past, history.present].slice(-HISTORY_LIMIT);
  return { past, present: next, future: [], lastField: field, lastAt: now };
}

export function historyUndo<T>(history: History<T>): History<T> {
  const previous = history.past[history.past.length - 1];
  if (previous === undefined) return history;
  return { past: history.past.slice(0, -1), present: previous, future: [history.present, ...history.future], lastField: null, lastAt: 0 };
}

export function historyRedo<T>(history: History<T>): History<T> {
  const [next, ...rest] = history.future;
  if (next === undefined) return history;
  return { past: [...history.past, history.present], present: next, future: rest, lastField: null, lastAt: 0 };
}

/** Starts again from `present` (after loading another revision): nothing to undo. */
export function historyReset<T>(present: T): History<T> {
  return historyCreate(present);
}

/** Ends the current merge, so that the next change of the same field is its own step (e.g. on pointer up). */
export function historySeal<T>(history: History<T>): History<T> {
  return history.lastField === null ? history : { ...history, lastField: null };
}
