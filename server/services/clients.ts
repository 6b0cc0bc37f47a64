import { ForeignKeyConstraintError, literal, Op, type Order, type Sequelize, type Transaction, type WhereOptions } from 'sequelize';
import type { ClientCreate, ClientListQuery, ClientPage, ClientUpdate, ClientView } from '../../shared/schemas/client.js';
import { Conflict, Forbidden, NotFound } from '../lib/errors.js';
import { Client, MeasurementSet } from '../models/index.js';
import type { ServiceContext } from './context.js';
import { versionCheck, versionedWrite, WriteConflict } from './versioned.js';

/** The pool the models were registered on (transactions start here). */
export function recordsDb(): Sequelize {
  const sequelize = Client.sequelize;
  if (!sequelize) throw new Error('Models are not initialised: call modelsInit first');
  return sequelize;
}

/** Owners create and change records; cutters only read them (the routes check this first). */
export function ownerRequire(ctx: ServiceContext): void {
  if (ctx.role !== 'owner') throw new Forbidden('Only an owner can change clients, measurements and fabrics.');
}

/**
 * A LIKE pattern matching `term` anywhere, with LIKE's own wildcards escaped so that a search
 * for "50%" finds "50%" only. The pattern is sent as a bound parameter, never spliced into SQL.
 */
export function likeContains(term: string): string {
  return `%${term.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

// Per-client figures for the list and the client page; the subqueries use no request input.
const LAST_TAKEN = literal(
  "(SELECT DATE_FORMAT(MAX(m.taken_at), '%Y-%m-%d') FROM measurement_sets m WHERE m.client_id = `Client`.`id`)",
);
const SET_COUNT = literal('(SELECT COUNT(DISTINCT m.set_id) FROM measurement_sets m WHERE m.client_id = `Client`.`id`)');
const AGGREGATES: [ReturnType<typeof literal>, string][] = [
  [LAST_TAKEN, 'lastTakenAt'],
  [SET_COUNT, 'measurementSetCount'],
];

/** A client as the caller may see it: a cutter gets no e-mail or phone (the keys are absent). */
export function clientView(client: Client, ctx: ServiceContext): ClientView {
  const lastTakenAt = client.get('lastTakenAt' as keyof Client) as string | null | undefined;
  const count = client.get('measurementSetCount' as keyof Client) as number | bigint | string | null | undefined;
  const view: ClientView = {
    id: client.id,
    name: client.name,
    notes: client.notes,
    archived: Boolean(client.archived),
    version: client.version,
    createdAt: client.createdAt.toISOString(),
    updatedAt: client.updatedAt.toISOString(),
    lastTakenAt: lastTakenAt ?? null,
    measurementSetCount: Number(count ?? 0),
  };
  if (ctx.role === 'owner') {
    view.email = client.email;
    view.phone = client.phone;
  }
  return view;
}

/**
 * The studio's client `id`, or 404 (another studio's client is simply not found).
 * @param lock lock the row for the rest of the transaction
 */
export async function clientFind(ctx: ServiceContext, id: number, transaction?: Transaction, lock = false): Promise<Client> {
  const client = await Client.findOne({
    where: { id, studioId: ctx.studioId },
    transaction,
    lock: lock && transaction ? transaction.LOCK.UPDATE : undefined,
  });
  if (!client) throw new NotFound('client');
  return client;
}

/** Throws a 409 for a change to an archived client: archived records are read-only until restored. */
export async function clientWritableRequire(ctx: ServiceContext, client: Client): Promise<void> {
  if (client.archived) {
    throw new Conflict('This client is archived. Restore the client before changing their records.', await clientGet(ctx, client.id));
  }
}

const SORT_COLUMNS: Record<ClientListQuery['sort'], string> = {
  name: 'name',
  createdAt: 'createdAt',
  updatedAt: 'updatedAt',
  lastTakenAt: 'lastTakenAt',
};

/** One page of the studio's clients, searched by name (and e-mail, for owners), sorted, filtered by archive status. */
export async function clientList(ctx: ServiceContext, query: ClientListQuery): Promise<ClientPage> {
  const where: WhereOptions<Client>[] = [{ studioId: ctx.studioId }];
  if (query.status !== 'all') where.push({ archived: query.status === 'archived' });
  const bind: Record<string, string> = {};
  if (query.q) {
    bind.q = likeContains(query.q);
    const match = { [Op.like]: literal('$q') };
    // A cutter cannot see e-mail addresses, so cannot search by them either.
    where.push(ctx.role === 'owner' ? { [Op.or]: [{ name: match }, { email: match }] } : { name: match });
  }
  const direction = query.order === 'desc' ? 'DESC' : 'ASC';
  const sortColumn = SORT_COLUMNS[query.sort];
  const order: Order =
    query.sort === 'lastTakenAt'
      ? [[literal('lastTakenAt'), direction], ['id', direction]]
      : [[sortColumn, direction], ['id', direction]];
  const filter = { [Op.and]: where };
  const { count: total, rows } = await Client.findAndCountAll({
      where: filter,
      bind,
      attributes: { include: AGGREGATES },
      order,
      limit: query.pageSize,
      offset: (query.page - 1) * query.pageSize,
    });
  return { items: rows.map((c) => clientView(c, ctx)), total, page: query.page, pageSize: query.pageSize };
}

/** One client with the date of the latest fitting and the number of sets. */
export async function clientGet(ctx: ServiceContext, id: number): Promise<ClientView> {
  const client = await Client.findOne({ where: { id, studioId: ctx.studioId }, attributes: { include: AGGREGATES } });
  if (!client) throw new NotFound('client');
  return clientView(client, ctx);
}

/** Adds a client to the studio. */
export async function clientCreate(ctx: ServiceContext, input: ClientCreate): Promise<ClientView> {
  ownerRequire(ctx);
  const client = await Client.create({
    studioId: ctx.studioId,
    name: input.name,
    email: input.email ?? null,
    phone: input.phone ?? null,
    notes: input.notes ?? null,
  });
  return clientGet(ctx, client.id);
}

const STALE_CLIENT = 'Someone else changed this client since you opened it. Compare the current details with yours and save again.';

/** Changes a client's details, provided nobody has changed them since `input.version`. */
export async function clientUpdate(ctx: ServiceContext, id: number, input: ClientUpdate): Promise<ClientView> {
  ownerRequire(ctx);
  await versionedWrite(
    recordsDb(),
    async (transaction) => {
      const client = await clientFind(ctx, id, transaction, true);
      versionCheck(client, input.version);
      await clientWritableRequire(ctx, client);
      const { version: _version, ...changes } = input;
      client.set(changes);
      await client.save({ transaction });
    },
    { message: STALE_CLIENT, current: () => clientGet(ctx, id) },
  );
  return clientGet(ctx, id);
}

/** Archives (hides from the active list, makes read-only) or restores a client. */
export async function clientArchive(ctx: ServiceContext, id: number, archived: boolean): Promise<ClientView> {
  ownerRequire(ctx);
  await versionedWrite(
    recordsDb(),
    async (transaction) => {
      const client = await clientFind(ctx, id, transaction, true);
      if (client.archived === archived) return;
      client.archived = archived;
      await client.save({ transaction });
    },
    { message: STALE_CLIENT, current: () => clientGet(ctx, id) },
  );
  return clientGet(ctx, id);
}

/**
 * Deletes a client entered by mistake. A client with measurement sets (or, through the
 * database's foreign keys, drafts or blocks) is never deleted: archive them instead.
 */
export async function clientDelete(ctx: ServiceContext, id: number): Promise<void> {
  ownerRequire(ctx);
  const inUse = 'This client has measurement sets or drafts and cannot be deleted. Archive the client instead.';
  try {
    await versionedWrite(
      recordsDb(),
      async (transaction) => {
        const client = await clientFind(ctx, id, transaction, true);
        const sets = await MeasurementSet.count({ where: { studioId: ctx.studioId, clientId: id }, transaction });
        if (sets > 0) throw new WriteConflict(inUse);
        await client.destroy({ transaction });
      },
      { message: inUse, current: () => clientGet(ctx, id) },
    );
  } catch (err) {
    if (err instanceof ForeignKeyConstraintError) throw new Conflict(inUse, await clientGet(ctx, id));
    throw err;
  }
}
