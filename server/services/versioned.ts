import { OptimisticLockError, type Sequelize, type Transaction } from 'sequelize';
import { Conflict } from '../lib/errors.js';

/**
 * Thrown inside a transaction when the write cannot go ahead against the record as it now is
 * (a stale version, a state that forbids it); mapped to a 409 with the current record outside.
 */
export class WriteConflict extends Error {
  constructor(readonly reason?: string) {
    super(reason ?? 'stale version');
  }
}

/** Throws WriteConflict unless the record is still at the version the caller read. */
export function versionCheck(record: { version: number }, sent: number): void {
  if (record.version !== sent) throw new WriteConflict();
}

/**
 * Runs `work` in a transaction. A WriteConflict, or Sequelize's optimistic lock failing on save,
 * becomes a 409 carrying the record as it now is, read after the rollback.
 */
export async function versionedWrite<T>(
  sequelize: Sequelize,
  work: (transaction: Transaction) => Promise<T>,
  conflict: { message: string; current: () => Promise<unknown> },
): Promise<T> {
  try {
    return await sequelize.transaction(work);
  } catch (err) {
    if (err instanceof WriteConflict) throw new Conflict(err.reason ?? conflict.message, await conflict.current());
    if (err instanceof OptimisticLockError) throw new Conflict(conflict.message, await conflict.current());
    throw err;
  }
}

/** ISO string of a date column (null stays null). */
export function isoOrNull(value: Date | null | undefined): string | null {
  return value ? value.toISOString() : null;
}
