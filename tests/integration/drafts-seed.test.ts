import { afterAll, describe, expect, it } from 'vitest';
import { Draft, Style } from '../../server/models/index.js';
import { DEMO_DRAFTS, DEMO_STYLES, demoDraftsSeed } from '../../server/seed/demo-drafts.js';
import { demoRecordsSeed } from '../../server/seed/demo-records.js';
import { demoStudioSeed } from '../../server/seed/demo-studio.js';
import { queueList } from '../../server/services/queue.js';
import { testAppCreate } from '../helpers/test-app.js';

const { sequelize, close } = testAppCreate();
afterAll(close);

describe('demo drafting data', () => {
  it('seeds styles, blocks and drafts in every state once; a second run adds nothing', async () => {
    const { studioId } = await demoStudioSeed(sequelize);
    await demoRecordsSeed(sequelize, studioId);
    await demoDraftsSeed(studioId);
    const again = await demoDraftsSeed(studioId);
    expect(again).toEqual({ styles: 0, blocks: 0, drafts: 0 });
    const styles = await Style.findAll({ where: { studioId } });
    expect(styles.map((s) => s.name).sort()).toEqual(DEMO_STYLES.map((s) => s.name).sort());
    // Other suites may add drafts to the demo studio in the test database: look at the demo ones.
    const drafts = await Draft.findAll({ where: { studioId, notes: DEMO_DRAFTS.map((d) => d.notes) } });
    expect(drafts.map((d) => [d.notes, d.state]).sort()).toEqual(DEMO_DRAFTS.map((d) => [d.notes, d.state]).sort());
    const saved = drafts.find((d) => d.notes === DEMO_DRAFTS[0]!.notes);
    expect(saved?.revision).toBe(1 + DEMO_DRAFTS[0]!.saves.length);
    const queue = await queueList({ userId: 0, studioId, role: 'cutter', unit: 'in' }, 'approved');
    const demoIds = new Set(drafts.map((d) => d.id));
    expect(queue.items.filter((i) => demoIds.has(i.id)).map((i) => i.client.name)).toEqual(['Marisol Venn', 'Hattie Oyelaran']);
  });
});
