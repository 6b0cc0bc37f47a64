import fs from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import { uploadsSuite } from './uploads-suite.js';

uploadsSuite('folder', async () => {
  const dir = await fs.mkdtemp(path.join(os.tmpdir(), 'kw-uploads-'));
  return { url: pathToFileURL(dir).href, stop: () => fs.rm(dir, { recursive: true, force: true }) };
});
