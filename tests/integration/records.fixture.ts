/**
 * Shared set-up of the records suites (clients, measurement sets, fabrics): studio A with its
 * owner and a cutter, studio B with its owner, and a caller with no session. Studios are made
 * once per file; every test makes its own records, so nothing is truncated between tests.
 */
import type { Express } from 'express';
import { QueryTypes, type Sequelize } from 'sequelize';
import request from 'supertest';
import { csrfHeaders, memberAdd, studioSignUp, type Agent } from '../helpers/auth.js';
import { testAppCreate } from '../helpers/test-app.js';

export { csrfHeaders };

export interface RecordsWorld {
  app: Express;
  sequelize: Sequelize;
  close: () => Promise<void>;
  studioId: number;
  otherStudioId: number;
  ownerId: number;
  ownerName: string;
  owner: Agent;
  cutter: Agent;
  otherOwner: Agent;
  anonymous: Agent;
}

/** Two studios and their members, signed in through the real sign-up and sign-in routes. */
export async function recordsWorldCreate(studioName: string): Promise<RecordsWorld> {
  const { app, sequelize, close } = testAppCreate();
  const a = await studioSignUp(app, { studioName, name: 'Wren Ashdown' });
  const cutter = await memberAdd(app, a.studio.id, 'cutter');
  const b = await studioSignUp(app, { studioName: `${studioName} (other)` });
  return {
    app,
    sequelize,
    close,
    studioId: a.studio.id,
    otherStudioId: b.studio.id,
    ownerId: a.owner.id,
    ownerName: a.owner.name,
    owner: a.agent,
    cutter: cutter.agent,
    otherOwner: b.agent,
    anonymous: request.agent(app),
  };
}

/** Every row of `table` that belongs to a studio, for "nothing was written" checks. */
export async function studioRows(sequelize: Sequelize, table: 'clients' | 'measurement_sets' | 'fabrics', studioId: number): Promise<unknown[]> {
  // The table name comes from the fixed union above, never from input.
  return sequelize.query(`SELECT * FROM \`${table}\` WHERE studio_id = ? ORDER BY id`, {
    replacements: [studioId],
    type: QueryTypes.SELECT,
  });
}
