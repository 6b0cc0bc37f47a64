import type { CorrectionCreate } from '../../shared/schemas/block.js';
import type { DraftState } from '../../shared/schemas/draft.js';
import type { ParamsMm } from '../../shared/schemas/style.js';
import { Block, Client, Draft, Fabric, MeasurementSet, Studio, Style, User } from '../models/index.js';
import { blockCreate } from '../services/blocks.js';
import type { ServiceContext } from '../services/context.js';
import { draftMove } from '../services/draft-states.js';
import { draftCreate, draftUpdate } from '../services/drafts.js';
import { styleCreate } from '../services/styles.js';

/**
 * The demo studio's drafting: three saved tank styles, a fitted block for three of the demo
 * clients (with the corrections found at their fittings) and drafts in every state, so the work
 * queue has something waiting. Everything goes through the same services as the API. Each item
 * is looked up first, so a second run changes nothing and a run cut short is finished by the next.
 */

const IN = 25.4;

// Necklines and straps as in the trade notes (common practice): back neck about 1 in, a scoop
// front 6–8 in, a high neck 3 in at the least, a racer back 2–3 in from the fold.
export const DEMO_STYLES: { name: string; racerBack: boolean; defaults: ParamsMm; notes: string }[] = [
  {
    name: 'Scoop tank',
    racerBack: false,
    defaults: { bustEase: -9, hipEase: 0, frontNeckDepth: 6.5 * IN, backNeckDepth: 1 * IN, strapWidth: 1 * IN },
    notes: 'The everyday tank: scoop front, straight back, bound with knit tape.',
  },
  {
    name: 'High-neck tank',
    racerBack: false,
    defaults: { bustEase: -8, hipEase: 0, frontNeckDepth: 3.5 * IN, backNeckDepth: 1 * IN, strapInset: 2.5 * IN, strapWidth: 1.5 * IN },
    notes: 'Higher at the front and wider straps; good for layering.',
  },
  {
    name: 'Racer tank',
    racerBack: true,
    defaults: { bustEase: -10, hipEase: 0, frontNeckDepth: 5 * IN, backNeckDepth: 1.5 * IN, racerBackInset: 2.5 * IN, edgeFinish: 'band' },
    notes: 'Racer back for training; self-fabric bands.',
  },
];

interface DemoBlock {
  client: string;
  takenAt: string;
  name: string;
  corrections: CorrectionCreate[];
}

export const DEMO_BLOCKS: DemoBlock[] = [
  {
    client: 'Marisol Venn',
    takenAt: '2026-02-20',
    name: 'Spring 2026 block',
    corrections: [
      { target: 'hip', amount: 10, note: '+1 cm at hip: pulled across the seat at the toile fitting', notedOn: '2026-02-20' },
      { target: 'armholeDepth', amount: -5, note: 'Armhole 0.5 cm higher: showed the bra band at the side', notedOn: '2026-02-20' },
    ],
  },
  {
    client: 'Hattie Oyelaran',
    takenAt: '2026-01-17',
    name: 'Winter 2026 block',
    corrections: [{ target: 'bustEase', amount: -2, note: 'Bust ease 2 % more negative: stood away at the underarm', notedOn: '2026-01-31' }],
  },
  {
    client: 'Clementine Rusk',
    takenAt: '2026-03-02',
    name: 'Petite block',
    corrections: [{ target: 'length', amount: -20, note: 'Shorter by 2 cm: sat too low on the hip', notedOn: '2026-03-02' }],
  },
];

interface DemoDraft {
  client: string;
  style: string;
  fabric: string;
  notes: string;
  dueOn: string | null;
  /** Saves after the first revision, in order. */
  saves: ParamsMm[];
  state: DraftState;
  cutNote?: string;
}

export const DEMO_DRAFTS: DemoDraft[] = [
  {
    client: 'Marisol Venn',
    style: 'Scoop tank',
    fabric: 'Heather grey cotton-spandex jersey',
    notes: 'Two for the spring: grey first.',
    dueOn: '2026-04-18',
    saves: [{ bustEase: -10 }, { bustEase: -10, frontNeckDepth: 7 * IN }],
    state: 'approved',
  },
  {
    client: 'Hattie Oyelaran',
    style: 'High-neck tank',
    fabric: 'Oat merino interlock',
    notes: 'Wide straps to cover the bra straps.',
    dueOn: '2026-04-05',
    saves: [{ strapWidth: 1.75 * IN }],
    state: 'approved',
  },
  {
    client: 'Marisol Venn',
    style: 'Racer tank',
    fabric: 'Coral swim tricot',
    notes: 'Training top.',
    dueOn: '2026-03-20',
    saves: [],
    state: 'delivered',
    cutNote: 'Cut with a fresh rotary blade; tricot slips, so pattern weights, no pins.',
  },
  {
    client: 'Clementine Rusk',
    style: 'High-neck tank',
    fabric: 'Moss 2×2 rib',
    notes: 'Rib tank, petite length.',
    dueOn: '2026-04-25',
    saves: [],
    state: 'cut',
    cutNote: 'Cut along one rib line; 55 cm used.',
  },
  {
    client: 'Clementine Rusk',
    style: 'Scoop tank',
    fabric: 'Ink bamboo jersey',
    notes: 'Still deciding on the neckline.',
    dueOn: null,
    saves: [{ frontNeckDepth: 6 * IN }],
    state: 'drafting',
  },
];

const ORDER: DraftState[] = ['drafting', 'approved', 'cut', 'sewn', 'delivered'];

async function clientId(studioId: number, name: string): Promise<number> {
  const client = await Client.findOne({ where: { studioId, name } });
  if (!client) throw new Error(`demo drafts: no demo client "${name}" (seed the records first)`);
  return client.id;
}

async function stylesSeed(owner: ServiceContext): Promise<number> {
  let made = 0;
  for (const s of DEMO_STYLES) {
    if (await Style.findOne({ where: { studioId: owner.studioId, name: s.name } })) continue;
    await styleCreate(owner, { ...s, garment: 'tank' });
    made += 1;
  }
  return made;
}

async function blocksSeed(owner: ServiceContext): Promise<number> {
  let made = 0;
  for (const b of DEMO_BLOCKS) {
    const id = await clientId(owner.studioId, b.client);
    if (await Block.findOne({ where: { studioId: owner.studioId, clientId: id, name: b.name } })) continue;
    // The newest version of the set taken that day (a corrected set has more than one).
    const set = await MeasurementSet.findOne({ where: { studioId: owner.studioId, clientId: id, takenAt: b.takenAt }, order: [['version', 'DESC']] });
    if (!set) throw new Error(`demo drafts: ${b.client} has no measurement set of ${b.takenAt}`);
    await blockCreate(owner, id, { measurementSetId: set.id, name: b.name, notes: '', corrections: b.corrections });
    made += 1;
  }
  return made;
}

/** Moves a demo draft on to its state, by the member who would do each step. */
async function stateReach(owner: ServiceContext, cutter: ServiceContext, draftId: number, target: DraftState, d: DemoDraft): Promise<void> {
  for (;;) {
    const draft = await Draft.findOne({ where: { id: draftId, studioId: owner.studioId } });
    if (!draft || ORDER.indexOf(draft.state) >= ORDER.indexOf(target)) return;
    const next = ORDER[ORDER.indexOf(draft.state) + 1]!;
    const version = draft.version;
    if (next === 'approved') await draftMove(owner, draftId, { to: 'approved', version, note: '' });
    else if (next === 'cut') await draftMove(cutter, draftId, { to: 'cut', version, fabricId: draft.fabricId, note: d.cutNote ?? '' });
    else if (next === 'sewn') await draftMove(cutter, draftId, { to: 'sewn', version, note: '' });
    else if (next === 'delivered') await draftMove(owner, draftId, { to: 'delivered', version, note: 'Collected at the studio.' });
    else return;
  }
}

async function draftsSeed(owner: ServiceContext, cutter: ServiceContext): Promise<number> {
  let made = 0;
  for (const d of DEMO_DRAFTS) {
    const cid = await clientId(owner.studioId, d.client);
    const style = await Style.findOne({ where: { studioId: owner.studioId, name: d.style } });
    const fabric = await Fabric.findOne({ where: { studioId: owner.studioId, name: d.fabric } });
    if (!style || !fabric) throw new Error(`demo drafts: style "${d.style}" or fabric "${d.fabric}" is missing`);
    let draft = await Draft.findOne({ where: { studioId: owner.studioId, clientId: cid, styleId: style.id, notes: d.notes } });
    if (!draft) {
      const created = await draftCreate(owner, { clientId: cid, styleId: style.id, fabricId: fabric.id, params: {}, dueOn: d.dueOn, notes: d.notes });
      let version = created.version;
      for (const params of d.saves) version = (await draftUpdate(owner, created.id, { version, params })).version;
      draft = await Draft.findByPk(created.id);
      made += 1;
    }
    await stateReach(owner, cutter, draft!.id, d.state, d);
  }
  return made;
}

/** Adds the demo styles, blocks and drafts to the demo studio, each once. */
export async function demoDraftsSeed(studioId: number): Promise<{ styles: number; blocks: number; drafts: number }> {
  const studio = await Studio.findByPk(studioId);
  const ownerUser = await User.findOne({ where: { studioId, role: 'owner' }, order: [['id', 'ASC']] });
  const cutterUser = await User.findOne({ where: { studioId, role: 'cutter' }, order: [['id', 'ASC']] });
  if (!studio || !ownerUser) throw new Error(`demo drafts: studio ${studioId} or its owner is missing`);
  const unit = studio.defaultUnit;
  const owner: ServiceContext = { userId: ownerUser.id, studioId, role: 'owner', unit };
  const cutter: ServiceContext = cutterUser ? { userId: cutterUser.id, studioId, role: 'cutter', unit } : owner;
  const styles = await stylesSeed(owner);
  const blocks = await blocksSeed(owner);
  const drafts = await draftsSeed(owner, cutter);
  return { styles, blocks, drafts };
}
