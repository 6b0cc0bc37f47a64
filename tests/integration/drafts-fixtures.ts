/**
 * Records that blocks and drafts point at, made straight in the database for a studio (the
 * records routes have their own tests), and small helpers to start drafts through the API.
 * Bodies: US misses and the engine's worked example (see each test for the source).
 */
import type { Agent } from '../helpers/auth.js';
import { csrfHeaders } from '../helpers/auth.js';
import { Client, Fabric, MeasurementSet } from '../../server/models/index.js';

/** 1 in = 25.4 mm exactly (NIST SP 811, appendix B). */
export const IN = 25.4;

export interface BodyMm {
  bust: number;
  hip: number;
  armholeDepth: number;
  waist?: number;
}

/**
 * The engine's worked example (issue 4, common practice): bust 38 in, hip 43 in; armhole depth
 * 8 1/2 in, in the 8–9 in of a fitted tank top (trade notes, common practice).
 */
export const WORKED_BODY: BodyMm = { bust: 38 * IN, hip: 43 * IN, armholeDepth: 8.5 * IN };

let counter = 0;
const unique = (label: string) => `${label} ${process.pid}-${Date.now().toString(36)}-${++counter}`;

/** A client with one measurement set (version 1) of this body. */
export async function clientWithSet(studioId: number, body: BodyMm = WORKED_BODY, takenAt = '2026-02-10'): Promise<{ clientId: number; setId: number }> {
  const client = await Client.create({ studioId, name: unique('Client') });
  const setId = await setAdd(studioId, client.id, body, takenAt);
  return { clientId: client.id, setId };
}

/** Another measurement set (version 1 of a new set) for a client; returns the row id. */
export async function setAdd(studioId: number, clientId: number, body: BodyMm, takenAt = '2026-03-14'): Promise<number> {
  const set = await MeasurementSet.create({
    studioId,
    clientId,
    setId: null,
    version: 1,
    takenAt,
    takenByName: 'Fixture Fitter',
    recordedByName: 'Fixture Fitter',
    bustMm: body.bust,
    hipMm: body.hip,
    armholeDepthMm: body.armholeDepth,
    waistMm: body.waist ?? null,
  } as never);
  set.setId = set.id;
  await set.save();
  return set.id;
}

/** A corrected version (2) of a set; returns the new row id. */
export async function setCorrect(studioId: number, clientId: number, setId: number, body: BodyMm): Promise<number> {
  const row = await MeasurementSet.create({
    studioId,
    clientId,
    setId,
    version: 2,
    takenAt: '2026-02-10',
    takenByName: 'Fixture Fitter',
    recordedByName: 'Fixture Fitter',
    bustMm: body.bust,
    hipMm: body.hip,
    armholeDepthMm: body.armholeDepth,
    waistMm: body.waist ?? null,
  } as never);
  return row.id;
}

/** A cotton-spandex jersey: 60 % crosswise, 40 % lengthwise (trade notes, approximate), 150 cm wide. */
export async function fabricAdd(studioId: number, over: { stretch?: number; widthMm?: number | null } = {}): Promise<number> {
  const fabric = await Fabric.create({
    studioId,
    name: unique('Jersey'),
    stretchCrosswise: over.stretch ?? 60,
    stretchLengthwise: 40,
    recovery: 'good',
    widthMm: over.widthMm === undefined ? 1500 : over.widthMm,
  } as never);
  return fabric.id;
}

/** Creates a style through the API as the given owner. */
export async function styleMake(agent: Agent, body: Record<string, unknown> = {}): Promise<{ id: number; version: number }> {
  const res = await agent.post('/api/styles').set(csrfHeaders).send({ name: unique('Style'), ...body });
  if (res.status !== 201) throw new Error(`styleMake: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body as { id: number; version: number };
}

/** Creates a block through the API. */
export async function blockMake(agent: Agent, clientId: number, setId: number, corrections: unknown[] = []): Promise<{ id: number; version: number }> {
  const res = await agent.post(`/api/clients/${clientId}/blocks`).set(csrfHeaders).send({ measurementSetId: setId, corrections });
  if (res.status !== 201) throw new Error(`blockMake: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body as { id: number; version: number };
}

export interface DraftWorld {
  clientId: number;
  setId: number;
  fabricId: number;
  styleId: number;
  blockId: number;
}

/** A client with a set, a fabric, a style and a block: everything a draft needs. */
export async function draftWorld(agent: Agent, studioId: number, style: Record<string, unknown> = {}): Promise<DraftWorld> {
  const { clientId, setId } = await clientWithSet(studioId);
  const fabricId = await fabricAdd(studioId);
  const { id: styleId } = await styleMake(agent, style);
  const { id: blockId } = await blockMake(agent, clientId, setId);
  return { clientId, setId, fabricId, styleId, blockId };
}

/** Starts a draft through the API; returns the response body (a DraftDto). */
export async function draftMake(agent: Agent, w: DraftWorld, body: Record<string, unknown> = {}) {
  const res = await agent
    .post('/api/drafts')
    .set(csrfHeaders)
    .send({ blockId: w.blockId, styleId: w.styleId, fabricId: w.fabricId, ...body });
  if (res.status !== 201) throw new Error(`draftMake: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body as { id: number; version: number; revision: number; state: string };
}
