import os from 'node:os';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import { describe, expect, it } from 'vitest';
import { storageFromUrl } from './storage-url.js';
import { storageKeyCheck } from './storage.js';

describe('storageFromUrl', () => {
  it('uses a folder when STORAGE_URL is unset or a file: URL', () => {
    expect(storageFromUrl(undefined).kind).toBe('folder');
    expect(storageFromUrl(pathToFileURL(path.join(os.tmpdir(), 'kw-any')).href).kind).toBe('folder');
  });

  it('uses an S3-compatible bucket for an s3: URL with its options', () => {
    const url = 's3://fitting-photos/studio?endpoint=http://127.0.0.1:4569&region=eu-west-1&forcePathStyle=true';
    expect(storageFromUrl(url, {}).kind).toBe('s3');
  });

  it('names STORAGE_URL and the problem for a bad value', () => {
    expect(() => storageFromUrl('ftp://files.example/photos')).toThrow(/STORAGE_URL: unknown scheme "ftp:"/);
    expect(() => storageFromUrl('not a url')).toThrow(/STORAGE_URL: not a URL/);
    expect(() => storageFromUrl('s3://bucket?endpoint=mailto:x')).toThrow(/STORAGE_URL: endpoint must be an http\(s\) address/);
    expect(() => storageFromUrl('s3://bucket?forcePathStyle=yes')).toThrow(/STORAGE_URL: forcePathStyle must be true or false/);
    expect(() => storageFromUrl('s3://bucket?secret=1')).toThrow(/STORAGE_URL: unknown option secret/);
  });
});

describe('storageKeyCheck', () => {
  it('accepts the keys the server makes', () => {
    expect(storageKeyCheck('photos/12/6f1c2a4e-0b7d-4c1e-9a55-2f0e1d3c4b5a-thumb.webp')).toBe('photos/12/6f1c2a4e-0b7d-4c1e-9a55-2f0e1d3c4b5a-thumb.webp');
  });

  it.each(['../etc/passwd', 'photos/../../x', '/photos/1.jpg', 'photos//1.jpg', 'Photos/1.jpg', 'photos/1.jpg\0'])('refuses %j', (key) => {
    expect(() => storageKeyCheck(key)).toThrow(/Invalid storage key/);
  });
});
