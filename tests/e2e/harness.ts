import { spawn, type ChildProcess } from 'node:child_process';
import { mkdirSync } from 'node:fs';
import net from 'node:net';
import path from 'node:path';
import { chromium, type Browser, type Page } from 'playwright-core';

export const ARTIFACTS = path.resolve('tests/artifacts');

/** Debian's chromium with the flags that work on this machine; never a downloaded browser. */
export function browserLaunch(): Promise<Browser> {
  return chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: [
      '--headless',
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
}

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = net.createServer();
    srv.listen(0, '127.0.0.1', () => {
      const address = srv.address();
      const port = typeof address === 'object' && address ? address.port : 0;
      srv.close(() => resolve(port));
    });
    srv.on('error', reject);
  });
}

export interface RunningServer {
  url: string;
  process: ChildProcess;
  stop: () => Promise<void>;
}

/** Starts the real server (serving the built client) against the test database. */
export async function serverStart(env: Record<string, string> = {}): Promise<RunningServer> {
  const port = await freePort();
  const child = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
    env: { ...process.env, NODE_ENV: 'test', SERVE_CLIENT: '1', PORT: String(port), LOG_LEVEL: 'warn', ...env },
    stdio: ['ignore', 'inherit', 'inherit'],
  });
  const url = `http://127.0.0.1:${port}`;
  const deadline = Date.now() + 30_000;
  for (;;) {
    try {
      const res = await fetch(`${url}/api/health`);
      if (res.ok) break;
    } catch {
      // not listening yet
    }
    if (child.exitCode !== null) throw new Error(`server exited with ${child.exitCode}`);
    if (Date.now() > deadline) throw new Error('server did not start within 30 s');
    await new Promise((r) => setTimeout(r, 200));
  }
  return {
    url,
    process: child,
    stop: () =>
      new Promise<void>((resolve) => {
        if (child.exitCode !== null) return resolve();
        child.once('exit', () => resolve());
        child.kill('SIGTERM');
      }),
  };
}

/** Saves a screenshot under tests/artifacts for a person to look at. */
export async function screenshot(page: Page, name: string): Promise<string> {
  mkdirSync(ARTIFACTS, { recursive: true });
  const file = path.join(ARTIFACTS, `${name}.png`);
  await page.screenshot({ path: file, fullPage: true });
  return file;
}
