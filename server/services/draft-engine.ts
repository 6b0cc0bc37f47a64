import { draft as engineDraft, ENGINE_VERSION, type Draft as EngineDraft } from '../../shared/engine/index.js';
import type { DraftInput } from '../../shared/schemas/draft-input.js';
import type { DraftComputed, EngineCheck, EngineDifference } from '../../shared/schemas/draft-dto.js';

/**
 * Figures within this of each other draw the same: a twentieth of a millimetre (or of a
 * percent) is far below what a printer, a pencil or a rotary cutter can show.
 */
export const DRAWING_MATCH = 0.05;

/** Strings whose change alters the drawing or what is cut; wording (messages, steps) is not compared. */
const COMPARED_STRINGS = new Set(['fold', 'code', 'field', 'finish', 'opening', 'id']);

export type ComputeResult =
  | { ok: true; engineVersion: string; computed: DraftComputed }
  | { ok: false; fields: Record<string, string> };

function computedFrom(d: EngineDraft): DraftComputed {
  const edges: DraftComputed['edges'] = {};
  for (const piece of d.pieces) edges[piece.id] = Object.fromEntries(piece.edges.map((e) => [e.name, e.length]));
  return { finished: d.finished, bindings: d.bindings, layout: d.layout, warnings: d.warnings, edges };
}

const BLOCK_NOTE = ' (from the block: its measurement set and fit corrections)';

/** Runs the current engine; a refusal comes back as field messages keyed by input path. */
export function draftCompute(input: DraftInput): ComputeResult {
  const result = engineDraft(input);
  if (result.ok) return { ok: true, engineVersion: ENGINE_VERSION, computed: computedFrom(result.draft) };
  const fields: Record<string, string> = {};
  for (const e of result.errors) {
    const key = e.path || '_';
    fields[key] ??= key.startsWith('measurements.') ? e.message + BLOCK_NOTE : e.message;
  }
  return { ok: false, fields };
}

type Leaf = number | string | null;

function leaves(value: unknown, path: string, out: Map<string, Leaf>): void {
  if (value === null || value === undefined) {
    out.set(path, null);
  } else if (typeof value === 'number') {
    out.set(path, value);
  } else if (typeof value === 'string') {
    const key = path.slice(path.lastIndexOf('.') + 1);
    if (COMPARED_STRINGS.has(key)) out.set(path, value);
  } else if (Array.isArray(value)) {
    out.set(`${path}.length`, value.length);
    value.forEach((item, i) => leaves(item, `${path}.${i}`, out));
  } else if (typeof value === 'object') {
    for (const [k, v] of Object.entries(value as Record<string, unknown>)) {
      if (k === 'steps' || k === 'placements') continue;
      leaves(v, path ? `${path}.${k}` : k, out);
    }
  }
}

function differs(a: Leaf | undefined, b: Leaf | undefined): boolean {
  if (typeof a === 'number' && typeof b === 'number') return Math.abs(a - b) > DRAWING_MATCH;
  return (a ?? null) !== (b ?? null);
}

/** The figures of two computations that differ, by dotted path ("finished.bust", "edges.front.neck"). */
export function computedCompare(stored: DraftComputed, current: DraftComputed): EngineDifference[] {
  const a = new Map<string, Leaf>();
  const b = new Map<string, Leaf>();
  leaves(stored, '', a);
  leaves(current, '', b);
  const out: EngineDifference[] = [];
  for (const path of new Set([...a.keys(), ...b.keys()])) {
    const s = a.get(path);
    const c = b.get(path);
    if (differs(s, c)) out.push({ path, stored: s ?? null, current: c ?? null });
  }
  return out;
}

/**
 * Re-runs the current engine on a stored input and says whether it would draw the draft
 * differently from the numbers stored with it.
 */
export function engineCheck(input: DraftInput, stored: DraftComputed, storedVersion: string): EngineCheck {
  const fresh = draftCompute(input);
  if (!fresh.ok) {
    return {
      storedVersion,
      currentVersion: ENGINE_VERSION,
      drawsDifferently: true,
      differences: Object.entries(fresh.fields).map(([path, message]) => ({ path, stored: null, current: message })),
    };
  }
  const differences = computedCompare(stored, fresh.computed);
  return { storedVersion, currentVersion: ENGINE_VERSION, drawsDifferently: differences.length > 0, differences };
}
