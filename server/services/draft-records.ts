import { Op, type Transaction } from 'sequelize';
import type { BlockMeasurementsMm, PersonDto } from '../../shared/schemas/block.js';
import type { DraftFabricDto } from '../../shared/schemas/draft-dto.js';
import { Client } from '../models/client.js';
import { Fabric } from '../models/fabric.js';
import { MeasurementSet } from '../models/measurement-set.js';
import { User } from '../models/user.js';
export { clientFind } from './clients.js';
import type { ServiceContext } from './context.js';

// The records that blocks and drafts point at (clients, measurement sets, fabrics, members),
// read the way drafting needs them, always scoped to the caller's studio.

export async function clientNames(c: ServiceContext, ids: number[], transaction?: Transaction): Promise<Map<number, string>> {
  const unique = [...new Set(ids)];
  if (unique.length === 0) return new Map();
  const rows = await Client.findAll({ where: { id: unique, studioId: c.studioId }, attributes: ['id', 'name'], transaction });
  return new Map(rows.map((r) => [r.id, r.name]));
}

/** One version of a measurement set, with the figures a tank top is drafted from (mm). */
export interface MeasurementSetRead {
  id: number;
  takenOn: string;
  measurements: BlockMeasurementsMm;
  /** The id of the set's newest version when this one has since been corrected, else null. */
  newerVersionId: number | null;
}

/**
 * A measurement set version of this client that holds bust, hip and armhole depth; null when
 * there is none (another client's, another studio's, or missing a figure a tank top needs).
 */
export async function measurementSetRead(
  c: ServiceContext,
  clientId: number,
  id: number,
  transaction?: Transaction,
): Promise<MeasurementSetRead | null> {
  const set = await MeasurementSet.findOne({ where: { id, clientId, studioId: c.studioId }, transaction });
  if (!set || set.bustMm === null || set.hipMm === null || set.armholeDepthMm === null) return null;
  const measurements: BlockMeasurementsMm = { bust: Number(set.bustMm), hip: Number(set.hipMm), armholeDepth: Number(set.armholeDepthMm) };
  if (set.waistMm !== null) measurements.waist = Number(set.waistMm);
  const newer = await MeasurementSet.findOne({
    where: { setId: set.setId ?? set.id, studioId: c.studioId, version: { [Op.gt]: set.version } },
    order: [['version', 'DESC']],
    attributes: ['id'],
    transaction,
  });
  return { id: set.id, takenOn: set.takenAt, measurements, newerVersionId: newer?.id ?? null };
}

function fabricDto(f: Fabric): DraftFabricDto {
  return {
    id: f.id,
    name: f.name,
    stretch: f.stretchCrosswise,
    stretchLengthwise: f.stretchLengthwise,
    recovery: f.recovery,
    widthMm: f.widthMm === null ? null : Number(f.widthMm),
  };
}

/** A fabric of the caller's studio as a draft uses it, or null. */
export async function fabricRead(c: ServiceContext, id: number, transaction?: Transaction): Promise<DraftFabricDto | null> {
  const fabric = await Fabric.findOne({ where: { id, studioId: c.studioId }, transaction });
  return fabric ? fabricDto(fabric) : null;
}

export async function fabricNames(c: ServiceContext, ids: number[], transaction?: Transaction): Promise<Map<number, string>> {
  const unique = [...new Set(ids)];
  if (unique.length === 0) return new Map();
  const rows = await Fabric.findAll({ where: { id: unique, studioId: c.studioId }, attributes: ['id', 'name'], transaction });
  return new Map(rows.map((r) => [r.id, r.name]));
}

/** Members of the caller's studio by id, for "who did it" (removed members are left out). */
export async function peopleByIds(c: ServiceContext, ids: (number | null)[], transaction?: Transaction): Promise<Map<number, PersonDto>> {
  const unique = [...new Set(ids.filter((id): id is number => id !== null))];
  if (unique.length === 0) return new Map();
  const rows = await User.findAll({ where: { id: unique, studioId: c.studioId }, attributes: ['id', 'name'], transaction });
  return new Map(rows.map((r) => [r.id, { id: r.id, name: r.name }]));
}
