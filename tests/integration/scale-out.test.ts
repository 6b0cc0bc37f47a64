/**
 * Two app servers, one database: the servers keep no state of their own, so a studio can run
 * several behind a load balancer (OWASP Session Management Cheat Sheet, "Session ID Life Cycle":
 * the session lives on the server side, here in MariaDB shared by every app server).
 */
import { spawn, type ChildProcess } from 'node:child_process';
import net from 'node:net';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { SIGN_IN_MAX_FAILURES } from '../../server/auth/throttle.js';
import { csrfHeaders, TEST_PASSWORD, testIp, uniqueEmail } from '../helpers/auth.js';

const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');
const START_TIMEOUT_MS = 60_000;

function portFree(): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = net.createServer();
    probe.once('error', reject);
    probe.listen(0, '127.0.0.1', () => {
      const { port } = probe.address() as net.AddressInfo;
      probe.close(() => resolve(port));
    });
  });
}

interface Server {
  base: string;
  child: ChildProcess;
  output: string[];
}

async function serverStart(): Promise<Server> {
  const port = await portFree();
  const output: string[] = [];
  const child = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
    cwd: ROOT,
    env: { ...process.env, NODE_ENV: 'test', DB_NAME: process.env.DB_NAME ?? 'knitwright_test', PORT: String(port), HOST: '127.0.0.1', LOG_LEVEL: 'warn' },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  child.stdout?.on('data', (d: Buffer) => output.push(d.toString()));
  child.stderr?.on('data', (d: Buffer) => output.push(d.toString()));
  const base = `http://127.0.0.1:${port}`;
  const deadline = Date.now() + START_TIMEOUT_MS;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`server exited early:\n${output.join('')}`);
    const up = await fetch(`${base}/api/health`).then((r) => r.ok, () => false);
    if (up) return { base, child, output };
    await new Promise((r) => setTimeout(r, 200));
  }
  child.kill('SIGTERM');
  throw new Error(`server did not answer within ${START_TIMEOUT_MS} ms:\n${output.join('')}`);
}

function serverStop(server: Server | undefined): Promise<void> {
  if (!server || server.child.exitCode !== null) return Promise.resolve();
  return new Promise((resolve) => {
    server.child.once('exit', () => resolve());
    server.child.kill('SIGTERM');
  });
}

async function call(server: Server, method: string, path: string, options: { cookie?: string; body?: unknown; ip?: string } = {}) {
  const headers: Record<string, string> = { ...csrfHeaders };
  if (options.cookie) headers.Cookie = options.cookie;
  if (options.ip) headers['X-Forwarded-For'] = options.ip;
  if (options.body !== undefined) headers['Content-Type'] = 'application/json';
  const res = await fetch(`${server.base}${path}`, { method, headers, body: options.body === undefined ? undefined : JSON.stringify(options.body) });
  const cookie = res.headers.getSetCookie().find((c) => c.startsWith('knitwright.sid='))?.split(';')[0];
  const text = await res.text();
  return { status: res.status, cookie, body: text ? (JSON.parse(text) as Record<string, unknown>) : undefined };
}

let one: Server | undefined;
let two: Server | undefined;

beforeAll(async () => {
  [one, two] = await Promise.all([serverStart(), serverStart()]);
}, 2 * START_TIMEOUT_MS);

afterAll(async () => {
  await Promise.all([serverStop(one), serverStop(two)]);
});

describe('two app servers on one database', () => {
  it('honours on one server a session made on the other, and a sign-out on either ends it on both', async () => {
    const email = uniqueEmail('scale');
    const signUp = await call(one!, 'POST', '/api/auth/signup', { body: { studioName: 'Twin Needle Studio', name: 'Ines Marr', email, password: TEST_PASSWORD } });
    expect(signUp.status).toBe(201);
    const cookie = signUp.cookie!;
    expect(cookie).toBeDefined();

    const onTwo = await call(two!, 'GET', '/api/auth/me', { cookie });
    expect(onTwo.status).toBe(200);
    expect((onTwo.body as { user: { email: string } }).user.email).toBe(email);

    // A change made through server two is seen by server one.
    expect((await call(two!, 'PATCH', '/api/studio', { cookie, body: { defaultUnit: 'cm' } })).status).toBe(200);
    expect(((await call(one!, 'GET', '/api/studio', { cookie })).body as { defaultUnit: string }).defaultUnit).toBe('cm');

    expect((await call(two!, 'POST', '/api/auth/signout', { cookie })).status).toBe(204);
    expect((await call(one!, 'GET', '/api/auth/me', { cookie })).status).toBe(401);
    expect((await call(two!, 'GET', '/api/auth/me', { cookie })).status).toBe(401);
  });

  it('counts sign-in failures across servers: failures on one lock the account on the other', async () => {
    const email = uniqueEmail('scale-throttle');
    const signUp = await call(one!, 'POST', '/api/auth/signup', { body: { studioName: 'Twin Needle Studio', name: 'Ines Marr', email, password: TEST_PASSWORD } });
    expect(signUp.status).toBe(201);
    for (let i = 0; i < SIGN_IN_MAX_FAILURES; i += 1) {
      const server = i % 2 === 0 ? one! : two!;
      expect((await call(server, 'POST', '/api/auth/signin', { ip: testIp(), body: { email, password: `nope-${i}-nope` } })).status).toBe(401);
    }
    expect((await call(two!, 'POST', '/api/auth/signin', { ip: testIp(), body: { email, password: TEST_PASSWORD } })).status).toBe(429);
    expect((await call(one!, 'POST', '/api/auth/signin', { ip: testIp(), body: { email, password: TEST_PASSWORD } })).status).toBe(429);
  });
});
