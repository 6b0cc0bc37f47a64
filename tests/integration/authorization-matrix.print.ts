/**
 * Authorization matrix entries of the print route, spread into MATRIX_ENTRIES: any member who
 * may read a draft may print it; another studio's owner is answered 404 (OWASP ASVS 5.0 §8.2.2).
 */
import type { MatrixEntry, MatrixFixture, Who } from './authorization-matrix.entries.js';
import { draftMake, draftWorld } from './drafts-fixtures.js';

const memberRecord = (status: number): Record<Who, number> => ({ anonymous: 401, cutter: status, owner: status, otherOwner: 404 });

const drafts = new WeakMap<MatrixFixture, Promise<number>>();
/** One draft of studio A, made once per run through the API as its owner. */
function draftOf(fx: MatrixFixture): Promise<number> {
  let id = drafts.get(fx);
  if (!id) {
    id = (async () => (await draftMake(fx.agent('owner'), await draftWorld(fx.agent('owner'), fx.studioId))).id)();
    drafts.set(fx, id);
  }
  return id;
}

export const PRINT_MATRIX_ENTRIES: MatrixEntry[] = [
  {
    method: 'GET',
    route: '/api/drafts/:id/pdf',
    expect: memberRecord(200),
    request: async (fx) => ({ path: `/api/drafts/${await draftOf(fx)}/pdf?kind=ticket&paper=a4` }),
  },
];
