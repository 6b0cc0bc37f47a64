import type { Readable } from 'node:stream';
import {
  DeleteObjectCommand,
  GetObjectCommand,
  ListObjectsV2Command,
  NoSuchKey,
  PutObjectCommand,
  S3Client,
  S3ServiceException,
} from '@aws-sdk/client-s3';
import { storageKeyCheck, StorageMissing, type StorageAdapter, type StoredFile } from './storage.js';

export interface S3StorageOptions {
  bucket: string;
  /** Folder inside the bucket, '' or ending in '/'. */
  prefix: string;
  /** An S3-compatible service's address; unset for AWS itself. */
  endpoint?: string;
  region: string;
  forcePathStyle: boolean;
  /** Unset: the SDK's own chain (environment, shared profile, instance role). */
  credentials?: { accessKeyId: string; secretAccessKey: string };
}

function isMissing(err: unknown): boolean {
  return err instanceof NoSuchKey || (err instanceof S3ServiceException && err.$metadata.httpStatusCode === 404);
}

/** Files in an S3-compatible bucket through the AWS SDK. */
export function s3StorageCreate(options: S3StorageOptions): StorageAdapter {
  const client = new S3Client({
    region: options.region,
    endpoint: options.endpoint,
    forcePathStyle: options.forcePathStyle,
    credentials: options.credentials,
    // Checksums only where S3 requires them: several S3-compatible stores refuse the newer
    // default trailing checksums, and every body here is a buffer of known length.
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
  });
  const Bucket = options.bucket;
  const objectKey = (key: string) => `${options.prefix}${storageKeyCheck(key)}`;

  return {
    kind: 's3',

    async put(key, body, contentType) {
      await client.send(new PutObjectCommand({ Bucket, Key: objectKey(key), Body: body, ContentType: contentType, ContentLength: body.length }));
    },

    async get(key): Promise<StoredFile> {
      try {
        const out = await client.send(new GetObjectCommand({ Bucket, Key: objectKey(key) }));
        if (!out.Body) throw new StorageMissing(key);
        return { body: out.Body as Readable, length: out.ContentLength };
      } catch (err) {
        if (isMissing(err)) throw new StorageMissing(key);
        throw err;
      }
    },

    async delete(key) {
      await client.send(new DeleteObjectCommand({ Bucket, Key: objectKey(key) }));
    },

    async list(prefix) {
      const keys: string[] = [];
      let ContinuationToken: string | undefined;
      do {
        const out = await client.send(new ListObjectsV2Command({ Bucket, Prefix: `${options.prefix}${prefix}`, ContinuationToken }));
        for (const item of out.Contents ?? []) if (item.Key) keys.push(item.Key.slice(options.prefix.length));
        ContinuationToken = out.IsTruncated ? out.NextContinuationToken : undefined;
      } while (ContinuationToken);
      return keys.sort();
    },
  };
}
