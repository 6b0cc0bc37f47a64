import type { Transaction } from 'sequelize';
import type { BlockDto, PersonDto } from '../../shared/schemas/block.js';
import { DRAFT_TRANSITIONS, TRANSITION_ROLES } from '../../shared/schemas/draft.js';
import type {
  DraftDto,
  DraftFabricDto,
  DraftSnapshot,
  DraftSummaryDto,
  RevisionDto,
  RevisionSummaryDto,
  StateStamp,
} from '../../shared/schemas/draft-dto.js';
import { draftInputBuild, type DraftInputParts } from '../../shared/schemas/draft-input-build.js';
import type { StyleDto } from '../../shared/schemas/style.js';
import { NotFound } from '../lib/errors.js';
import { Draft, DraftRevision, Style } from '../models/index.js';
import { blockDto, blockFind } from './blocks.js';
import type { ServiceContext } from './context.js';
import { engineCheck } from './draft-engine.js';
import { clientNames, fabricNames, fabricRead, peopleByIds } from './draft-records.js';
import { styleDto } from './styles.js';

/** A draft of the caller's studio, or 404; `lock` holds its row until the transaction ends. */
export async function draftFind(c: ServiceContext, id: number, transaction?: Transaction, lock = false): Promise<Draft> {
  const draft = await Draft.findOne({ where: { id, studioId: c.studioId }, transaction, lock: lock && transaction ? transaction.LOCK.UPDATE : undefined });
  if (!draft) throw new NotFound('draft');
  return draft;
}

/** What a draft's columns say now, in the shape a revision keeps. */
export function snapshotOf(draft: Draft): DraftSnapshot {
  return {
    blockId: draft.blockId,
    styleId: draft.styleId,
    fabricId: draft.fabricId,
    params: draft.params,
    dueOn: draft.dueOn,
    notes: draft.notes,
  };
}

/** The engine input's parts for a draft written in `unit`. */
export function partsOf(unit: DraftInputParts['unit'], block: BlockDto, style: StyleDto, fabric: DraftFabricDto): DraftInputParts {
  return {
    unit,
    measurements: block.measurements,
    corrections: block.corrections.map((k) => ({ target: k.target, amount: k.amount })),
    fabric: { stretch: fabric.stretch, stretchLengthwise: fabric.stretchLengthwise, recovery: fabric.recovery, widthMm: fabric.widthMm },
    style: { garment: style.garment, racerBack: style.racerBack, defaults: style.defaults },
  };
}

export function revisionSummary(r: DraftRevision, people: Map<number, PersonDto>): RevisionSummaryDto {
  return {
    number: r.number,
    kind: r.kind,
    restoredFrom: r.restoredFrom,
    createdAt: r.createdAt.toISOString(),
    createdBy: r.userId === null ? null : (people.get(r.userId) ?? null),
    changes: r.changes,
    engineVersion: r.engineVersion,
  };
}

export function revisionDto(r: DraftRevision, people: Map<number, PersonDto>): RevisionDto {
  return { ...revisionSummary(r, people), snapshot: r.snapshot, input: r.input, computed: r.computed };
}

export async function revisionFind(c: ServiceContext, draftId: number, number: number, transaction?: Transaction): Promise<DraftRevision> {
  const revision = await DraftRevision.findOne({ where: { draftId, number, studioId: c.studioId }, transaction });
  if (!revision) throw new NotFound('revision');
  return revision;
}

function stamp(at: Date | null, by: number | null, note: string | null, people: Map<number, PersonDto>): StateStamp | null {
  if (!at) return null;
  return { at: at.toISOString(), by: by === null ? null : (people.get(by) ?? null), note: note ?? '' };
}

/** What a write already holds, so the answer does not read it again. */
export interface DraftPreload {
  block: BlockDto;
  style: StyleDto;
  fabric: DraftFabricDto;
  /** The newest revision, computed by the current engine in this request. */
  current: DraftRevision;
}

async function partsLoad(c: ServiceContext, draft: Draft, transaction?: Transaction): Promise<Omit<DraftPreload, 'current'>> {
  const block = await blockDto(c, await blockFind(c, draft.blockId, undefined, transaction), transaction);
  const styleRow = await Style.findOne({ where: { id: draft.styleId, studioId: c.studioId }, transaction });
  const fabric = await fabricRead(c, draft.fabricId, transaction);
  if (!styleRow || !fabric) throw new Error(`draft ${draft.id}: its style or fabric is missing`);
  return { block, style: styleDto(styleRow), fabric };
}

/**
 * The draft in full: its parts, newest revision, state stamps, engine check and the caller's
 * moves. With `preload` (a write that has just drawn the newest revision) nothing is read twice
 * and the engine check needs no second run.
 */
export async function draftDto(c: ServiceContext, draft: Draft, transaction?: Transaction, preload?: DraftPreload): Promise<DraftDto> {
  const { block, style, fabric } = preload ?? (await partsLoad(c, draft, transaction));
  const current = preload?.current ?? (await revisionFind(c, draft.id, draft.revision, transaction));
  const people = await peopleByIds(c, [draft.approvedBy, draft.cutBy, draft.sewnBy, draft.deliveredBy, current.userId], transaction);
  const clients = await clientNames(c, [draft.clientId], transaction);
  const cutFabric = draft.cutFabricId === null ? null : ((await fabricNames(c, [draft.cutFabricId], transaction)).get(draft.cutFabricId) ?? null);
  const inputParts = partsOf(draft.unit, block, style, fabric);
  const approvedStamp = stamp(draft.approvedAt, draft.approvedBy, null, people);
  const cutStamp = stamp(draft.cutAt, draft.cutBy, draft.cutNote, people);
  return {
    id: draft.id,
    state: draft.state,
    client: { id: draft.clientId, name: clients.get(draft.clientId) ?? '' },
    blockId: draft.blockId,
    dueOn: draft.dueOn,
    revision: draft.revision,
    stateChangedAt: draft.stateChangedAt.toISOString(),
    createdAt: draft.createdAt.toISOString(),
    updatedAt: draft.updatedAt.toISOString(),
    version: draft.version,
    unit: draft.unit,
    params: draft.params,
    notes: draft.notes,
    style,
    fabric,
    block,
    inputParts,
    inputOutdated: JSON.stringify(draftInputBuild(inputParts, draft.params)) !== JSON.stringify(current.input),
    current: revisionDto(current, people),
    approved:
      approvedStamp && draft.approvedRevision !== null && draft.approvedEngineVersion !== null
        ? { ...approvedStamp, revision: draft.approvedRevision, engineVersion: draft.approvedEngineVersion }
        : null,
    cut: cutStamp ? { ...cutStamp, fabric: cutFabric === null || draft.cutFabricId === null ? null : { id: draft.cutFabricId, name: cutFabric } } : null,
    sewn: stamp(draft.sewnAt, draft.sewnBy, draft.sewnNote, people),
    delivered: stamp(draft.deliveredAt, draft.deliveredBy, draft.deliveredNote, people),
    engineCheck: preload
      ? { storedVersion: current.engineVersion, currentVersion: current.engineVersion, drawsDifferently: false, differences: [] }
      : engineCheck(current.input, current.computed, current.engineVersion),
    allowedMoves: DRAFT_TRANSITIONS[draft.state].filter((s) => TRANSITION_ROLES[s].includes(c.role)),
    editable: c.role === 'owner' && draft.state === 'drafting',
  };
}

/** Rows of the drafts list, names filled in with one query per kind. */
export async function draftSummaries(c: ServiceContext, drafts: Draft[]): Promise<DraftSummaryDto[]> {
  const clients = await clientNames(c, drafts.map((d) => d.clientId));
  const fabrics = await fabricNames(c, drafts.map((d) => d.fabricId));
  const styleIds = [...new Set(drafts.map((d) => d.styleId))];
  const styles = new Map(
    (styleIds.length ? await Style.findAll({ where: { id: styleIds, studioId: c.studioId } }) : []).map((s) => [s.id, s.name]),
  );
  return drafts.map((d) => ({
    id: d.id,
    state: d.state,
    client: { id: d.clientId, name: clients.get(d.clientId) ?? '' },
    style: { id: d.styleId, name: styles.get(d.styleId) ?? '' },
    fabric: { id: d.fabricId, name: fabrics.get(d.fabricId) ?? '' },
    blockId: d.blockId,
    dueOn: d.dueOn,
    revision: d.revision,
    stateChangedAt: d.stateChangedAt.toISOString(),
    createdAt: d.createdAt.toISOString(),
    updatedAt: d.updatedAt.toISOString(),
    version: d.version,
  }));
}
