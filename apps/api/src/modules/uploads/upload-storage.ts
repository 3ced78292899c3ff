// The one storage interface for uploaded files. Services know only `FileStorage`; the local-disk
// implementation below is the default (a folder per instance, from env.uploadsDir). Another
// implementation (an object store) would keep the same three calls.
import { createReadStream } from 'node:fs';
import { mkdir, rename, rm, stat, writeFile } from 'node:fs/promises';
import { dirname, join, resolve, sep } from 'node:path';
import type { Readable } from 'node:stream';

export interface FileStorage {
  /** Stores `data` under `key`, replacing nothing: keys are new random ids. */
  put(key: string, data: Uint8Array): Promise<void>;
  /** The bytes under `key` as a stream; rejects with `StoredFileMissingError` when absent. */
  get(key: string): Promise<Readable>;
  /** Removes `key`; removing a key that is not there is not an error. */
  delete(key: string): Promise<void>;
}

export class StoredFileMissingError extends Error {
  constructor(key: string) {
    super(`No stored file under ${key}`);
    this.name = 'StoredFileMissingError';
  }
}

/** Keys are ours (`<company id>/<uuid>`), never a client's name: anything else is refused. */
const keyPattern = /^[0-9a-f-]{36}\/[0-9a-f-]{36}$/;

export function createLocalDiskStorage(rootDir: string): FileStorage {
  const root = resolve(rootDir);
  const pathOf = (key: string): string => {
    if (!keyPattern.test(key)) throw new Error(`Not a storage key: ${key.slice(0, 80)}`);
    const path = resolve(join(root, key));
    // Belt and braces: the pattern already rules out `..`.
    if (!path.startsWith(root + sep)) throw new Error('Storage key escapes the storage folder');
    return path;
  };
  return {
    async put(key, data) {
      const path = pathOf(key);
      await mkdir(dirname(path), { recursive: true });
      // Written beside and renamed, so a reader never sees half a file.
      const partial = `${path}.partial`;
      await writeFile(partial, data, { flag: 'wx' });
      await rename(partial, path);
    },
    async get(key) {
      const path = pathOf(key);
      try {
        await stat(path);
      } catch {
        throw new StoredFileMissingError(key);
      }
      return createReadStream(path);
    },
    async delete(key) {
      await rm(pathOf(key), { force: true });
    },
  };
}
