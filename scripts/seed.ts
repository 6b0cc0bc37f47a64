// Seeds the demo studio into the configured database; safe to run on every start.
import { configLoad } from '../server/config.js';
import { sequelizeCreate } from '../server/db/sequelize.js';
import { modelsInit } from '../server/models/index.js';
import { demoStudioSeed } from '../server/seed/demo-studio.js';
import { demoRecordsSeed } from '../server/seed/demo-records.js';
import { demoDraftsSeed } from '../server/seed/demo-drafts.js';

const config = configLoad();
const sequelize = sequelizeCreate(config);
modelsInit(sequelize);
try {
  const result = await demoStudioSeed(sequelize);
  console.log(`[seed] demo studio ${result.created ? 'created' : 'already present'} (id ${result.studioId})`);
  const records = await demoRecordsSeed(sequelize, result.studioId);
  console.log(`[seed] demo records: ${records.clients} clients and ${records.fabrics} fabrics added`);
  const drafting = await demoDraftsSeed(result.studioId);
  console.log(`[seed] demo drafting: ${drafting.styles} styles, ${drafting.blocks} blocks and ${drafting.drafts} drafts added`);
} finally {
  await sequelize.close();
}
