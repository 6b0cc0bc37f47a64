import fs from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import S3rver from 's3rver';
import { uploadsSuite } from './uploads-suite.js';

const BUCKET = 'knitwright-test-uploads';

/** s3rver, a local S3 fake, on a free loopback port with its data in a temp folder; it checks request signatures with these keys. */
uploadsSuite('S3', async () => {
  const dir = await fs.mkdtemp(path.join(os.tmpdir(), 'kw-s3rver-'));
  const server = new S3rver({ address: '127.0.0.1', port: 0, directory: dir, silent: true, configureBuckets: [{ name: BUCKET, configs: [] }] });
  const { port } = await server.run();
  process.env.AWS_ACCESS_KEY_ID = 'S3RVER';
  process.env.AWS_SECRET_ACCESS_KEY = 'S3RVER';
  return {
    url: `s3://${BUCKET}/studio-files?endpoint=http://127.0.0.1:${port}&region=us-east-1&forcePathStyle=true`,
    stop: async () => {
      await server.close();
      await fs.rm(dir, { recursive: true, force: true });
    },
  };
});
