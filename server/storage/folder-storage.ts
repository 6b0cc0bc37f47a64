import { randomBytes } from 'node:crypto';
import fs from 'node:fs/promises';
import path from 'node:path';
import { storageKeyCheck, StorageMissing, type StorageAdapter, type StoredFile } from './storage.js';

function isMissing(err: unknown): boolean {
  return (err as NodeJS.ErrnoException).code === 'ENOENT';
}

/**
 * Files in a folder on this machine (by default `.data/uploads` inside the project). A file is
 * written beside its final name and renamed into place, so a reader never sees half a file.
 */
export function folderStorageCreate(root: string): StorageAdapter {
  const base = path.resolve(root);
  const fileOf = (key: string) => path.join(base, ...storageKeyCheck(key).split('/'));

  return {
    kind: 'folder',

    async put(key, body) {
      const file = fileOf(key);
      await fs.mkdir(path.dirname(file), { recursive: true });
      const temp = `${file}.${randomBytes(6).toString('hex')}.part`;
      try {
        await fs.writeFile(temp, body, { flag: 'wx' });
        await fs.rename(temp, file);
      } catch (err) {
        await fs.rm(temp, { force: true });
        throw err;
      }
    },

    async get(key): Promise<StoredFile> {
      let handle: fs.FileHandle;
      try {
        handle = await fs.open(fileOf(key), 'r');
      } catch (err) {
        if (isMissing(err)) throw new StorageMissing(key);
        throw err;
      }
      const { size } = await handle.stat();
      return { body: handle.createReadStream(), length: size };
    },

    async delete(key) {
      await fs.rm(fileOf(key), { force: true });
    },

    async list(prefix) {
      let names: string[];
      try {
        names = await fs.readdir(base, { recursive: true });
      } catch (err) {
        if (isMissing(err)) return [];
        throw err;
      }
      const keys: string[] = [];
      for (const name of names) {
        const key = name.split(path.sep).join('/');
        if (!key.startsWith(prefix)) continue;
        const stat = await fs.stat(path.join(base, name));
        if (stat.isFile()) keys.push(key);
      }
      return keys.sort();
    },
  };
}
