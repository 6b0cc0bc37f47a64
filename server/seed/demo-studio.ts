import type { Sequelize } from 'sequelize';
import { passwordHash } from '../lib/password.js';
import { Studio, User } from '../models/index.js';

/** The invented demo studio that `npm start` creates, and the accounts printed beside it. */
export const DEMO = {
  studio: 'Loop & Lark Knitwear',
  owner: { email: 'ada@loopandlark.example', name: 'Ada Quill', password: 'knit-demo-owner' },
  cutter: { email: 'rowan@loopandlark.example', name: 'Rowan Vale', password: 'knit-demo-cutter' },
} as const;

/** Creates the demo studio and its two members once; later runs change nothing. */
export async function demoStudioSeed(sequelize: Sequelize): Promise<{ created: boolean; studioId: number }> {
  return sequelize.transaction(async (transaction) => {
    const existing = await User.findOne({ where: { email: DEMO.owner.email }, transaction });
    if (existing) return { created: false, studioId: existing.studioId };
    const studio = await Studio.create({ name: DEMO.studio, defaultUnit: 'in', defaultPaper: 'letter' }, { transaction });
    for (const [role, person] of [['owner', DEMO.owner], ['cutter', DEMO.cutter]] as const) {
      await User.create(
        { studioId: studio.id, email: person.email, name: person.name, role, passwordHash: await passwordHash(person.password) },
        { transaction },
      );
    }
    return { created: true, studioId: studio.id };
  });
}
