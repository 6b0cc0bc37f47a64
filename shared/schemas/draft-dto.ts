/**
 * What the draft, revision and queue routes answer. Lengths in mm, eases and stretch in percent,
 * times as ISO strings, dates as "YYYY-MM-DD".
 */
import type { Binding, Finished, FoldLayout, Warning } from '../engine/types';
import type { BlockDto, PersonDto } from './block';
import type { DraftState } from './draft';
import type { DraftInput } from './draft-input';
import type { DraftInputParts } from './draft-input-build';
import type { ParamsMm, StyleDto } from './style';

export const REVISION_KINDS = ['created', 'saved', 'restored', 'reopened'] as const;
export type RevisionKind = (typeof REVISION_KINDS)[number];

/** What a revision saved: enough to restore it. */
export interface DraftSnapshot {
  blockId: number;
  styleId: number;
  fabricId: number;
  params: ParamsMm;
  dueOn: string | null;
  notes: string;
}

/** One changed field of a save: "params.bustEase", "fabricId", "dueOn", "notes", ... */
export interface DraftChange {
  field: string;
  from: number | string | null;
  to: number | string | null;
}

/** The engine's numbers stored with a revision. */
export interface DraftComputed {
  finished: Finished;
  bindings: Binding[];
  layout: FoldLayout;
  warnings: Warning[];
  /** Stitching-line edge lengths, mm, by piece id then edge name: the outline in figures. */
  edges: Record<string, Record<string, number>>;
}

/** A revision in the history list. */
export interface RevisionSummaryDto {
  number: number;
  kind: RevisionKind;
  restoredFrom: number | null;
  createdAt: string;
  createdBy: PersonDto | null;
  changes: DraftChange[];
  engineVersion: string;
}

/** One revision in full. */
export interface RevisionDto extends RevisionSummaryDto {
  snapshot: DraftSnapshot;
  input: DraftInput;
  computed: DraftComputed;
}

/** One figure the current engine gives differently from the stored one. */
export interface EngineDifference {
  path: string;
  stored: number | string | null;
  current: number | string | null;
}

/**
 * Stored numbers against a fresh run of the current engine on the same input. `drawsDifferently`
 * is true when a figure moved by more than the tolerance or the warnings changed.
 */
export interface EngineCheck {
  storedVersion: string;
  currentVersion: string;
  drawsDifferently: boolean;
  differences: EngineDifference[];
}

export interface NamedRef {
  id: number;
  name: string;
}

/** The fabric as a draft shows it. */
export interface DraftFabricDto extends NamedRef {
  stretch: number;
  stretchLengthwise: number | null;
  recovery: 'good' | 'fair' | 'poor';
  widthMm: number | null;
}

/** A row of the drafts list. */
export interface DraftSummaryDto {
  id: number;
  state: DraftState;
  client: NamedRef;
  style: NamedRef;
  fabric: NamedRef;
  blockId: number;
  dueOn: string | null;
  revision: number;
  stateChangedAt: string;
  createdAt: string;
  updatedAt: string;
  version: number;
}

export interface StateStamp {
  at: string;
  by: PersonDto | null;
  note: string;
}

/** A draft in full, with its newest revision and the engine check. */
export interface DraftDto extends Omit<DraftSummaryDto, 'fabric' | 'style'> {
  unit: 'in' | 'cm';
  params: ParamsMm;
  notes: string;
  style: StyleDto;
  fabric: DraftFabricDto;
  block: BlockDto;
  /** Everything but the parameters: feed to draftInputBuild(parts, params) in the browser. */
  inputParts: DraftInputParts;
  /**
   * True when the block, style or fabric changed since the last save, so the next save (or the
   * live drawing) differs from `current.input`.
   */
  inputOutdated: boolean;
  current: RevisionDto;
  approved: (StateStamp & { revision: number; engineVersion: string }) | null;
  cut: (StateStamp & { fabric: NamedRef | null }) | null;
  sewn: StateStamp | null;
  delivered: StateStamp | null;
  engineCheck: EngineCheck;
  /** States the caller may move this draft to now. */
  allowedMoves: DraftState[];
  /** True when the caller may save parameters now (owner, drafting). */
  editable: boolean;
}

/** A row of the work queue. */
export interface QueueItemDto {
  id: number;
  state: DraftState;
  client: NamedRef;
  style: NamedRef;
  fabric: NamedRef;
  dueOn: string | null;
  /** When the draft entered its state (approved, for the cutting queue). */
  since: string;
  revision: number;
  engineVersion: string;
  /** Fabric length needed along the grain, mm, and the fold, from the stored numbers. */
  lengthNeeded: number;
  fold: FoldLayout['fold'];
  warnings: number;
  version: number;
}
