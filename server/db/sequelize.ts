import { Sequelize } from 'sequelize';
import type { AppConfig } from '../config.js';

/** One connection pool to the studio database. */
export function sequelizeCreate(config: AppConfig): Sequelize {
  return new Sequelize(config.DB_NAME, config.DB_USER, config.DB_PASSWORD, {
    host: config.DB_HOST,
    port: config.DB_PORT,
    dialect: 'mariadb',
    logging: false,
    pool: { max: config.DB_POOL_MAX, min: 0, idle: 10_000, acquire: 20_000 },
    dialectOptions: { connectTimeout: 5_000 },
    timezone: '+00:00',
    define: { underscored: true },
  });
}
