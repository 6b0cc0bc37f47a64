import { UniqueConstraintError, type Transaction } from 'sequelize';
import {
  MEASUREMENT_KEYS,
  measurementWarnings,
  type MeasurementSetCorrect,
  type MeasurementSetCreate,
  type MeasurementSetDetail,
  type MeasurementSetList,
  type MeasurementSetView,
  type MeasurementValuesMm,
  type MeasurementVersionSummary,
} from '../../shared/schemas/measurement.js';
import { NotFound } from '../lib/errors.js';
import { MeasurementSet, User } from '../models/index.js';
import { measurementColumn } from '../models/measurement-set.js';
import { clientFind, clientWritableRequire, ownerRequire, recordsDb } from './clients.js';
import type { ServiceContext } from './context.js';
import { versionCheck, versionedWrite, WriteConflict } from './versioned.js';

type ValueColumns = Pick<MeasurementSet, `${(typeof MEASUREMENT_KEYS)[number]}Mm`>;

function valuesFromRow(row: MeasurementSet): MeasurementValuesMm {
  const values: Partial<Record<(typeof MEASUREMENT_KEYS)[number], number>> = {};
  for (const key of MEASUREMENT_KEYS) {
    const mm = row[measurementColumn(key)];
    if (mm !== null && mm !== undefined) values[key] = Number(mm);
  }
  return values as MeasurementValuesMm;
}

/** The row columns of a set of values in mm (null where not taken). */
export function valuesToColumns(values: MeasurementValuesMm): ValueColumns {
  const columns = {} as ValueColumns;
  const given = values as Partial<Record<(typeof MEASUREMENT_KEYS)[number], number>>;
  for (const key of MEASUREMENT_KEYS) columns[measurementColumn(key)] = given[key] ?? null;
  return columns;
}

function versionView(row: MeasurementSet, versionCount: number, ctx: ServiceContext): MeasurementSetView {
  const valuesMm = valuesFromRow(row);
  return {
    id: row.id,
    setId: row.setId ?? row.id,
    clientId: row.clientId,
    version: row.version,
    versionCount,
    isCurrent: row.version === versionCount,
    takenAt: row.takenAt,
    takenBy: { id: row.takenById ?? null, name: row.takenByName },
    recordedBy: { id: row.recordedById ?? null, name: row.recordedByName },
    recordedAt: row.createdAt.toISOString(),
    notes: row.notes,
    valuesMm,
    studioUnit: ctx.unit,
    warnings: measurementWarnings(valuesMm, ctx.unit),
  };
}

function summaryOf(row: MeasurementSet): MeasurementVersionSummary {
  return {
    id: row.id,
    version: row.version,
    recordedBy: { id: row.recordedById ?? null, name: row.recordedByName },
    recordedAt: row.createdAt.toISOString(),
    notes: row.notes,
  };
}

/** Every version of one set, newest first; 404 when the set is not this client's in this studio. */
async function versionsOf(ctx: ServiceContext, clientId: number, setId: number, transaction?: Transaction): Promise<MeasurementSet[]> {
  const rows = await MeasurementSet.findAll({
    where: { studioId: ctx.studioId, clientId, setId },
    order: [['version', 'DESC']],
    transaction,
  });
  if (rows.length === 0) throw new NotFound('measurement set');
  return rows;
}

/** The current version of each of a client's sets, newest fitting first. */
export async function measurementSetList(ctx: ServiceContext, clientId: number): Promise<MeasurementSetList> {
  await clientFind(ctx, clientId);
  const rows = await MeasurementSet.findAll({
    where: { studioId: ctx.studioId, clientId },
    order: [
      ['takenAt', 'DESC'],
      ['setId', 'DESC'],
      ['version', 'DESC'],
    ],
  });
  const counts = new Map<number, number>();
  for (const row of rows) counts.set(row.setId ?? row.id, (counts.get(row.setId ?? row.id) ?? 0) + 1);
  const seen = new Set<number>();
  const items: MeasurementSetView[] = [];
  for (const row of rows) {
    const setId = row.setId ?? row.id;
    if (seen.has(setId)) continue;
    seen.add(setId);
    items.push(versionView(row, counts.get(setId) ?? 1, ctx));
  }
  return { items, studioUnit: ctx.unit };
}

/** A set's current version with the history of its versions. */
export async function measurementSetGet(ctx: ServiceContext, clientId: number, setId: number): Promise<MeasurementSetDetail> {
  const rows = await versionsOf(ctx, clientId, setId);
  const current = rows[0] as MeasurementSet;
  return { ...versionView(current, rows.length, ctx), versions: rows.map(summaryOf) };
}

/** One version of a set, current or superseded. */
export async function measurementVersionGet(
  ctx: ServiceContext,
  clientId: number,
  setId: number,
  version: number,
): Promise<MeasurementSetView> {
  const rows = await versionsOf(ctx, clientId, setId);
  const row = rows.find((r) => r.version === version);
  if (!row) throw new NotFound('version of this measurement set');
  return versionView(row, rows.length, ctx);
}

async function memberName(ctx: ServiceContext, transaction: Transaction): Promise<string> {
  const member = await User.findOne({ where: { id: ctx.userId, studioId: ctx.studioId }, transaction });
  return member?.name ?? 'Unknown member';
}

/** Records a new measurement set (a new fitting) for a client. */
export async function measurementSetCreate(ctx: ServiceContext, clientId: number, input: MeasurementSetCreate): Promise<MeasurementSetDetail> {
  ownerRequire(ctx);
  const setId = await recordsDb().transaction(async (transaction) => {
    const client = await clientFind(ctx, clientId, transaction, true);
    await clientWritableRequire(ctx, client);
    const name = await memberName(ctx, transaction);
    const row = await MeasurementSet.create(
      {
        studioId: ctx.studioId,
        clientId,
        setId: null,
        version: 1,
        takenAt: input.takenAt,
        takenById: ctx.userId,
        takenByName: name,
        recordedById: ctx.userId,
        recordedByName: name,
        notes: input.notes,
        ...valuesToColumns(input.valuesMm),
      },
      { transaction },
    );
    // The first version names the set; set in the same transaction, so no reader sees it unset.
    await row.update({ setId: row.id }, { transaction });
    return row.id;
  });
  return measurementSetGet(ctx, clientId, setId);
}

const STALE_SET =
  'This measurement set was corrected by someone else since you opened it. Compare the current version with yours and save again.';

/**
 * Corrects a set: records its next version, keeping every earlier one. Refused with 409 when
 * `input.version` is not the current version.
 */
export async function measurementSetCorrect(
  ctx: ServiceContext,
  clientId: number,
  setId: number,
  input: MeasurementSetCorrect,
): Promise<MeasurementSetDetail> {
  ownerRequire(ctx);
  await versionedWrite(
    recordsDb(),
    async (transaction) => {
      const client = await clientFind(ctx, clientId, transaction, true);
      const [latest] = await versionsOf(ctx, clientId, setId, transaction);
      if (!latest) throw new NotFound('measurement set');
      versionCheck(latest, input.version);
      await clientWritableRequire(ctx, client);
      const name = await memberName(ctx, transaction);
      try {
        await MeasurementSet.create(
          {
            studioId: ctx.studioId,
            clientId,
            setId,
            version: latest.version + 1,
            takenAt: input.takenAt,
            takenById: latest.takenById,
            takenByName: latest.takenByName,
            recordedById: ctx.userId,
            recordedByName: name,
            notes: input.notes,
            ...valuesToColumns(input.valuesMm),
          },
          { transaction },
        );
      } catch (err) {
        // Another correction of the same version got there first.
        if (err instanceof UniqueConstraintError) throw new WriteConflict(STALE_SET);
        throw err;
      }
    },
    { message: STALE_SET, current: () => measurementSetGet(ctx, clientId, setId) },
  );
  return measurementSetGet(ctx, clientId, setId);
}
