import type { Sequelize, Transaction } from 'sequelize';
import { fabricCreateSchema, type FabricCreateInput } from '../../shared/schemas/fabric.js';
import { measurementSetCreateSchema, type MeasurementSetCreateInput } from '../../shared/schemas/measurement.js';
import { Client, Fabric, MeasurementSet, User } from '../models/index.js';
import { valuesToColumns } from '../services/measurements.js';

/**
 * The demo studio's records: invented clients with a few fittings each (one set corrected
 * after the fitting, one client archived) and a handful of invented knits. Values are typed the
 * way an owner would type them and go through the same schemas as the API. E-mail addresses use
 * the reserved example.com domain; phone numbers are from the ranges kept for fiction.
 */
interface DemoFitting extends MeasurementSetCreateInput {
  /** A correction recorded after the fitting: the changed values and why. */
  correction?: { values: MeasurementSetCreateInput['values']; notes: string };
}

interface DemoClient {
  name: string;
  email?: string;
  phone?: string;
  notes?: string;
  archived?: boolean;
  fittings: DemoFitting[];
}

export const DEMO_CLIENTS: DemoClient[] = [
  {
    name: 'Marisol Venn',
    email: 'marisol.venn@example.com',
    phone: '+44 20 7946 0321',
    notes: 'Likes a close fit at the bust and an easy hip. Wore a light moulded-cup bra at fittings.',
    fittings: [
      {
        takenAt: '2025-04-12',
        unit: 'cm',
        values: {
          bust: 91, highBust: 86, underbust: 76, waist: 74, hip: 99, neckBase: 37, shoulderLength: 12.5, acrossBack: 35,
          acrossFront: 33, napeToWaist: 41, shoulderToBust: 26, armholeDepth: 20.5, shoulderToHip: 62, upperArm: 28, armLength: 58, wrist: 15.5,
        },
        notes: 'First fitting.',
      },
      {
        takenAt: '2025-10-03',
        unit: 'cm',
        values: { bust: 92.5, highBust: 87, underbust: 77, waist: 75, hip: 100, armholeDepth: 21, napeToWaist: 41, shoulderLength: 12.5 },
        notes: 'Autumn refit for the racer-back.',
        correction: {
          values: { bust: 92.5, highBust: 87, underbust: 77, waist: 75, hip: 101, armholeDepth: 21, napeToWaist: 41, shoulderLength: 12.5 },
          notes: 'Hip re-measured over the fullest part of the seat.',
        },
      },
      {
        takenAt: '2026-02-20',
        unit: 'cm',
        values: { bust: 92, highBust: 86.5, underbust: 76.5, waist: 74.5, hip: 100.5, armholeDepth: 21, upperArm: 28.5 },
        notes: 'Spring camisole fitting.',
      },
    ],
  },
  {
    name: 'Hattie Oyelaran',
    email: 'hattie.o@example.com',
    phone: '(555) 010-0147',
    notes: 'Prefers wide straps that cover the bra straps.',
    fittings: [
      {
        takenAt: '2025-06-07',
        unit: 'in',
        values: { bust: '38 1/4', highBust: 36, underbust: 32, waist: 31, hip: '41 1/2', neckBase: '14 3/4', armholeDepth: '8 3/4', napeToWaist: '16 1/2', upperArm: 12 },
        notes: 'Measured over a cotton tee.',
      },
      {
        takenAt: '2026-01-17',
        unit: 'in',
        values: { bust: '37 3/4', highBust: '35 3/4', underbust: '31 1/2', waist: '30 1/2', hip: 41, neckBase: '14 3/4', armholeDepth: '8 3/4', napeToWaist: '16 1/2', upperArm: '11 3/4' },
      },
    ],
  },
  {
    name: 'Clementine Rusk',
    email: 'clem.rusk@example.com',
    notes: 'Petite; shorten the armhole and the length.',
    fittings: [
      { takenAt: '2025-08-22', unit: 'cm', values: { bust: 82, underbust: 70, waist: 64, hip: 88, armholeDepth: 18.5, napeToWaist: 37, shoulderToHip: 54 } },
      { takenAt: '2026-03-02', unit: 'cm', values: { bust: 83, underbust: 70.5, waist: 65, hip: 89, armholeDepth: 18.5, napeToWaist: 37, shoulderToHip: 54 } },
    ],
  },
  {
    name: 'Ines Fairweather',
    phone: '+44 161 496 0782',
    notes: 'Wants a scoop front no deeper than 7 in.',
    fittings: [{ takenAt: '2026-02-05', unit: 'in', values: { bust: 44, highBust: 41, waist: 37, hip: 46, armholeDepth: '9 1/2', acrossBack: '15 1/2' } }],
  },
  {
    name: 'Beatrix Lomond',
    email: 'b.lomond@example.com',
    notes: 'Moved away; kept for her measurement history.',
    archived: true,
    fittings: [{ takenAt: '2024-11-09', unit: 'cm', values: { bust: 96, waist: 80, hip: 104, armholeDepth: 21.5 } }],
  },
];

export const DEMO_FABRICS: FabricCreateInput[] = [
  {
    name: 'Heather grey cotton-spandex jersey',
    fibreContent: '95 % cotton, 5 % elastane',
    unit: 'in', width: 60, weightGsm: 200, stretchCrosswise: 60, stretchLengthwise: 40, recovery: 'good',
    notes: 'Curls to the right side at the cut edge.',
  },
  {
    name: 'Ink bamboo jersey',
    fibreContent: '95 % bamboo viscose, 5 % elastane',
    unit: 'cm', width: 150, weightGsm: 190, stretchCrosswise: 50, stretchLengthwise: 30, recovery: 'fair',
    notes: 'Drapes well; grows a little through the day.',
  },
  {
    name: 'Oat merino interlock',
    fibreContent: '100 % merino wool',
    unit: 'cm', width: 160, weightGsm: 220, stretchCrosswise: 50, stretchLengthwise: 25, recovery: 'good',
    notes: 'Wash cool; press with a cloth.',
  },
  {
    name: 'Moss 2×2 rib',
    fibreContent: '97 % cotton, 3 % elastane',
    unit: 'cm', width: 100, weightGsm: 260, stretchCrosswise: 80, stretchLengthwise: 20, recovery: 'fair',
    notes: 'Tubular; opened along a rib line. Good for bands.',
  },
  {
    name: 'Navy ponte',
    fibreContent: '66 % viscose, 29 % nylon, 5 % elastane',
    unit: 'in', width: 58, weightGsm: 300, stretchCrosswise: 25, stretchLengthwise: 15, recovery: 'good',
  },
  {
    name: 'Coral swim tricot',
    fibreContent: '80 % nylon, 20 % elastane',
    unit: 'cm', width: 150, weightGsm: 190, stretchCrosswise: 90, stretchLengthwise: 80, recovery: 'good',
    notes: 'Four-way stretch.',
  },
  {
    name: 'Rust slub jersey',
    fibreContent: '100 % cotton',
    unit: 'in', width: 66, weightGsm: 150, stretchCrosswise: 35, stretchLengthwise: 10, recovery: 'poor',
    notes: 'Relaxed fits only: it does not spring back.',
  },
];

async function clientSeed(demo: DemoClient, studioId: number, owner: User, transaction: Transaction): Promise<void> {
  const client = await Client.create(
    { studioId, name: demo.name, email: demo.email ?? null, phone: demo.phone ?? null, notes: demo.notes ?? null, archived: demo.archived ?? false },
    { transaction },
  );
  const by = { takenById: owner.id, takenByName: owner.name, recordedById: owner.id, recordedByName: owner.name };
  for (const fitting of demo.fittings) {
    const { correction, ...taken } = fitting;
    const first = measurementSetCreateSchema.parse(taken);
    const row = await MeasurementSet.create(
      { studioId, clientId: client.id, setId: null, version: 1, takenAt: first.takenAt, notes: first.notes, ...by, ...valuesToColumns(first.valuesMm) },
      { transaction },
    );
    await row.update({ setId: row.id }, { transaction });
    if (correction) {
      const fixed = measurementSetCreateSchema.parse({ ...taken, ...correction });
      await MeasurementSet.create(
        { studioId, clientId: client.id, setId: row.id, version: 2, takenAt: fixed.takenAt, notes: fixed.notes, ...by, ...valuesToColumns(fixed.valuesMm) },
        { transaction },
      );
    }
  }
}

/**
 * Adds the demo clients and fabrics to a studio, each once: a client or fabric whose name the
 * studio already has is left as it is, so later runs change nothing. One transaction: all or nothing.
 */
export async function demoRecordsSeed(sequelize: Sequelize, studioId: number): Promise<{ clients: number; fabrics: number }> {
  return sequelize.transaction(async (transaction) => {
    const owner = await User.findOne({ where: { studioId, role: 'owner' }, order: [['id', 'ASC']], transaction });
    if (!owner) throw new Error(`demo records: studio ${studioId} has no owner`);
    let clients = 0;
    for (const demo of DEMO_CLIENTS) {
      if (await Client.findOne({ where: { studioId, name: demo.name }, transaction })) continue;
      await clientSeed(demo, studioId, owner, transaction);
      clients += 1;
    }
    let fabrics = 0;
    for (const input of DEMO_FABRICS) {
      const fabric = fabricCreateSchema.parse(input);
      if (await Fabric.findOne({ where: { studioId, name: fabric.name }, transaction })) continue;
      await Fabric.create(
        {
          studioId,
          name: fabric.name,
          fibreContent: fabric.fibreContent ?? null,
          widthMm: fabric.widthMm ?? null,
          weightGsm: fabric.weightGsm ?? null,
          stretchCrosswise: fabric.stretchCrosswise,
          stretchLengthwise: fabric.stretchLengthwise ?? null,
          recovery: fabric.recovery,
          notes: fabric.notes ?? null,
        },
        { transaction },
      );
      fabrics += 1;
    }
    return { clients, fabrics };
  });
}
