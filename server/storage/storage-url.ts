import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { z } from 'zod';
import { folderStorageCreate } from './folder-storage.js';
import { s3StorageCreate } from './s3-storage.js';
import type { StorageAdapter } from './storage.js';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');

/** Where uploads go when STORAGE_URL is not set: inside the project, git-ignored. */
export const DEFAULT_UPLOADS_FOLDER = path.join(root, '.data', 'uploads');

const s3Query = z.strictObject({
  endpoint: z.url({ protocol: /^https?$/, error: 'endpoint must be an http(s) address' }).optional(),
  region: z.string().min(1, 'region must not be empty').default('us-east-1'),
  forcePathStyle: z.enum(['true', 'false'], { error: 'forcePathStyle must be true or false' }).default('false'),
});

function invalid(message: string): Error {
  return new Error(`Invalid configuration:\n  STORAGE_URL: ${message}`);
}

/**
 * The storage adapter STORAGE_URL names:
 * - unset: the folder `.data/uploads` in the project;
 * - `file:///absolute/folder`: another folder;
 * - `s3://bucket[/prefix]?endpoint=http://host:port&region=us-east-1&forcePathStyle=true`: an
 *   S3-compatible bucket, signed with AWS_ACCESS_KEY_ID / AWS_SECRET_ACCESS_KEY when both are set
 *   (otherwise the AWS SDK's usual credential chain).
 */
export function storageFromUrl(storageUrl: string | undefined, env: NodeJS.ProcessEnv = process.env): StorageAdapter {
  if (!storageUrl) return folderStorageCreate(DEFAULT_UPLOADS_FOLDER);
  let url: URL;
  try {
    url = new URL(storageUrl);
  } catch {
    throw invalid('not a URL; use file:///folder or s3://bucket?endpoint=...');
  }
  if (url.protocol === 'file:') return folderStorageCreate(fileURLToPath(url));
  if (url.protocol !== 's3:') throw invalid(`unknown scheme "${url.protocol}"; use file: or s3:`);
  if (!url.hostname) throw invalid('name the bucket: s3://bucket');
  const query = s3Query.safeParse(Object.fromEntries(url.searchParams));
  if (!query.success) throw invalid(query.error.issues.map((i) => (i.code === 'unrecognized_keys' ? `unknown option ${i.keys.join(', ')}` : i.message)).join('; '));
  const prefix = decodeURIComponent(url.pathname).replace(/^\/+|\/+$/g, '');
  const { AWS_ACCESS_KEY_ID: accessKeyId, AWS_SECRET_ACCESS_KEY: secretAccessKey } = env;
  return s3StorageCreate({
    bucket: url.hostname,
    prefix: prefix ? `${prefix}/` : '',
    endpoint: query.data.endpoint,
    region: query.data.region,
    forcePathStyle: query.data.forcePathStyle === 'true',
    credentials: accessKeyId && secretAccessKey ? { accessKeyId, secretAccessKey } : undefined,
  });
}
