import type { Readable } from 'node:stream';

/** A stored file as read back: its bytes as a stream, and its length when the store knows it. */
export interface StoredFile {
  body: Readable;
  length?: number;
}

/**
 * Where uploaded files live: a folder on this machine or an S3-compatible bucket. Keys are
 * made by the server (never from a file name): lower-case letters, digits, `-`, `_`, `.` and
 * `/` between segments.
 */
export interface StorageAdapter {
  /** `folder` or `s3`, for logs and messages. */
  readonly kind: 'folder' | 's3';
  /** Stores `body` under `key`, replacing any file there. */
  put(key: string, body: Buffer, contentType: string): Promise<void>;
  /** The file under `key`; throws `StorageMissing` when there is none. */
  get(key: string): Promise<StoredFile>;
  /** Removes the file under `key`; a missing file is not an error. */
  delete(key: string): Promise<void>;
  /** Every key that starts with `prefix` (for finding files left without a record). */
  list(prefix: string): Promise<string[]>;
}

/** No file under this key. */
export class StorageMissing extends Error {
  constructor(readonly key: string) {
    super(`No stored file under ${key}`);
    this.name = 'StorageMissing';
  }
}

const KEY = /^[a-z0-9][a-z0-9_.-]*(\/[a-z0-9][a-z0-9_.-]*)*$/;

/** Throws for a key that could step out of its folder or bucket prefix (`..`, `//`, a leading `/`). */
export function storageKeyCheck(key: string): string {
  if (!KEY.test(key) || key.split('/').some((part) => part === '.' || part === '..') || key.length > 200) {
    throw new Error(`Invalid storage key: ${JSON.stringify(key)}`);
  }
  return key;
}
