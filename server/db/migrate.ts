import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { Umzug, SequelizeStorage } from 'umzug';
import type { QueryInterface, Sequelize } from 'sequelize';

const here = path.dirname(fileURLToPath(import.meta.url));

export interface MigrationContext {
  queryInterface: QueryInterface;
  sequelize: Sequelize;
}

/** Versioned schema changes from server/db/migrations, recorded in the `schema_migrations` table. */
export function migratorCreate(sequelize: Sequelize): Umzug<MigrationContext> {
  return new Umzug<MigrationContext>({
    migrations: {
      glob: ['migrations/*.ts', { cwd: here, ignore: ['**/*.test.ts'] }],
      resolve: ({ name, path: file }) => ({
        name,
        up: async ({ context }) => (await import(file!)).up(context),
        down: async ({ context }) => (await import(file!)).down(context),
      }),
    },
    context: { queryInterface: sequelize.getQueryInterface(), sequelize },
    storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
    logger: undefined,
  });
}

/** Applies every pending migration; returns their names. */
export async function migrationsRun(sequelize: Sequelize): Promise<string[]> {
  const done = await migratorCreate(sequelize).up();
  return done.map((m) => m.name);
}
