import type { Express } from 'express';
import type { Sequelize } from 'sequelize';
import { appCreate } from '../../server/app.js';
import { configLoad, type AppConfig } from '../../server/config.js';
import { sequelizeCreate } from '../../server/db/sequelize.js';
import { loggerCreate } from '../../server/lib/logger.js';
import { modelsInit } from '../../server/models/index.js';

export interface TestApp {
  app: Express;
  sequelize: Sequelize;
  config: AppConfig;
  close: () => Promise<void>;
}

/** The real app against the real test database (migrated by scripts/test.sh). */
export function testAppCreate(overrides: Partial<Record<string, string>> = {}): TestApp {
  const config = configLoad({ ...process.env, NODE_ENV: 'test', DB_NAME: process.env.DB_NAME ?? 'knitwright_test', ...overrides });
  const sequelize = sequelizeCreate(config);
  modelsInit(sequelize);
  const app = appCreate({ config, sequelize, logger: loggerCreate(config) });
  return { app, sequelize, config, close: () => sequelize.close() };
}

/** Empties every table but the migration log, children first. */
export async function tablesTruncate(sequelize: Sequelize): Promise<void> {
  const [rows] = await sequelize.query(
    "SELECT table_name AS name FROM information_schema.tables WHERE table_schema = DATABASE() AND table_name <> 'schema_migrations'",
  );
  await sequelize.query('SET FOREIGN_KEY_CHECKS = 0');
  for (const row of rows as { name: string }[]) await sequelize.query(`TRUNCATE TABLE \`${row.name}\``);
  await sequelize.query('SET FOREIGN_KEY_CHECKS = 1');
}
