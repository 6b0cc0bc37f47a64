import { UniqueConstraintError, type Transaction } from 'sequelize';
import type { StyleCreate, StyleDto, StyleUpdate } from '../../shared/schemas/style.js';
import { Invalid, NotFound } from '../lib/errors.js';
import { Style } from '../models/index.js';
import type { ServiceContext } from './context.js';
import { versionCheck, versionedWrite } from './versioned.js';

export function styleDto(style: Style): StyleDto {
  return {
    id: style.id,
    name: style.name,
    garment: style.garment,
    racerBack: style.racerBack,
    defaults: style.defaults,
    notes: style.notes,
    archived: style.archived,
    version: style.version,
    createdAt: style.createdAt.toISOString(),
    updatedAt: style.updatedAt.toISOString(),
  };
}

/** A style of the caller's studio, or 404. */
export async function styleFind(c: ServiceContext, id: number, transaction?: Transaction): Promise<Style> {
  const style = await Style.findOne({ where: { id, studioId: c.studioId }, transaction });
  if (!style) throw new NotFound('style');
  return style;
}

function duplicateName(name: string): Invalid {
  return new Invalid('Some fields need attention.', { name: `This studio already has a style named "${name}"` });
}

export async function styleList(c: ServiceContext, archived: 'true' | 'false' | 'all'): Promise<{ items: StyleDto[] }> {
  const where = archived === 'all' ? { studioId: c.studioId } : { studioId: c.studioId, archived: archived === 'true' };
  const styles = await Style.findAll({ where, order: [['name', 'ASC'], ['id', 'ASC']] });
  return { items: styles.map(styleDto) };
}

export async function styleGet(c: ServiceContext, id: number): Promise<StyleDto> {
  return styleDto(await styleFind(c, id));
}

export async function styleCreate(c: ServiceContext, input: StyleCreate): Promise<StyleDto> {
  try {
    const style = await Style.create({ studioId: c.studioId, ...input });
    return styleDto(style);
  } catch (err) {
    if (err instanceof UniqueConstraintError) throw duplicateName(input.name);
    throw err;
  }
}

/** Saves changed fields; a stale version answers 409 with the style as it now is. */
export async function styleUpdate(c: ServiceContext, id: number, input: StyleUpdate): Promise<StyleDto> {
  const { version, ...changes } = input;
  const sequelize = Style.sequelize!;
  try {
    return await versionedWrite(
      sequelize,
      async (transaction) => {
        const style = await styleFind(c, id, transaction);
        versionCheck(style, version);
        const next = { ...changes };
        // Turning the racer back off drops the inset it carried.
        if (next.racerBack === false && next.defaults === undefined && style.defaults.racerBackInset !== undefined) {
          const { racerBackInset: _drop, ...rest } = style.defaults;
          next.defaults = rest;
        }
        style.set(next);
        if (style.changed()) await style.save({ transaction });
        return styleDto(style);
      },
      {
        message: 'This style was changed by someone else since you opened it. Reload it to see their changes, then apply yours again.',
        current: async () => styleDto(await styleFind(c, id)),
      },
    );
  } catch (err) {
    if (err instanceof UniqueConstraintError) throw duplicateName(changes.name ?? '');
    throw err;
  }
}
