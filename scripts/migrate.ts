// Applies pending migrations to the configured database (DB_NAME).
import { configLoad } from '../server/config.js';
import { migrationsRun } from '../server/db/migrate.js';
import { sequelizeCreate } from '../server/db/sequelize.js';

const config = configLoad();
const sequelize = sequelizeCreate(config);
try {
  const applied = await migrationsRun(sequelize);
  console.log(`[migrate] ${config.DB_NAME}: ${applied.length ? `applied ${applied.join(', ')}` : 'up to date'}`);
} finally {
  await sequelize.close();
}
