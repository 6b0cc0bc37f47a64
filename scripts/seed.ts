// Seeds the demo studio into the configured database; safe to run on every start.
import { configLoad } from '../server/config.js';
import { sequelizeCreate } from '../server/db/sequelize.js';
import { modelsInit } from '../server/models/index.js';
import { demoStudioSeed } from '../server/seed/demo-studio.js';

const config = configLoad();
const sequelize = sequelizeCreate(config);
modelsInit(sequelize);
try {
  const result = await demoStudioSeed(sequelize);
  console.log(`[seed] demo studio ${result.created ? 'created' : 'already present'} (id ${result.studioId})`);
} finally {
  await sequelize.close();
}
