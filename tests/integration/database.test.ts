import { QueryTypes } from 'sequelize';
import { afterAll, describe, expect, it } from 'vitest';
import { testAppCreate } from '../helpers/test-app.js';

// Sequelize 6.37 with the mariadb connector 3.1+ throws "Cannot delete property 'meta'" on raw
// queries; the project pins the connector at 3.0.2. These checks fail if that trap comes back.
describe('Sequelize with the mariadb connector', () => {
  const { sequelize, close } = testAppCreate();
  afterAll(close);

  it('runs raw SELECT queries and returns plain rows', async () => {
    const rows = await sequelize.query<{ two: number }>('SELECT 1 + 1 AS two', { type: QueryTypes.SELECT });
    expect(Number(rows[0]?.two)).toBe(2);
  });

  it('runs raw queries with replacements', async () => {
    const [rows] = await sequelize.query('SELECT ? AS word', { replacements: ['stretch'] });
    expect((rows as { word: string }[])[0]?.word).toBe('stretch');
  });

  it('has applied every migration', async () => {
    const rows = await sequelize.query<{ name: string }>('SELECT name FROM schema_migrations', { type: QueryTypes.SELECT });
    expect(rows.map((r) => r.name)).toContain('0001-accounts.ts');
  });
});
