import { mkdtemp, readdir, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { text } from 'node:stream/consumers';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { StoredFileMissingError, createLocalDiskStorage } from './upload-storage.js';
import type { FileStorage } from './upload-storage.js';
import { prepareUpload, safeFileName, withStoredFile } from './uploads.service.js';

const ctx = {
  userId: '00000000-0000-4000-8000-000000000001',
  companyId: '00000000-0000-4000-8000-0000000000c0',
  role: 'owner' as const,
};

describe('local-disk storage', () => {
  let dir: string;
  let storage: FileStorage;

  beforeAll(async () => {
    dir = await mkdtemp(join(tmpdir(), 'sw-storage-'));
    storage = createLocalDiskStorage(dir);
  });
  afterAll(() => rm(dir, { recursive: true, force: true }));

  it('puts, streams back and deletes a file under its key', async () => {
    const key = `${ctx.companyId}/00000000-0000-4000-8000-00000000f001`;
    await storage.put(key, Buffer.from('hello'));
    expect(await text(await storage.get(key))).toBe('hello');
    await storage.delete(key);
    await expect(storage.get(key)).rejects.toBeInstanceOf(StoredFileMissingError);
    await storage.delete(key); // a second delete is not an error
  });

  it('refuses keys that are not ours (no path can leave the folder)', async () => {
    for (const key of ['../x', `${ctx.companyId}/../../etc/passwd`, 'a/b', '']) {
      await expect(storage.put(key, Buffer.from('x'))).rejects.toThrow(/storage key/i);
    }
  });

  it('removes the stored file when the save after it fails', async () => {
    const prepared = prepareUpload(ctx, {
      kind: 'test',
      buffer: Buffer.from('bytes'),
      contentType: 'image/png',
      originalName: 'a.png',
      extension: 'png',
    });
    await expect(
      withStoredFile(storage, prepared, () => Promise.reject(new Error('the database said no'))),
    ).rejects.toThrow('the database said no');
    expect(await readdir(join(dir, ctx.companyId))).toEqual([]);
  });
});

describe('safeFileName', () => {
  it('keeps a plain name and puts the checked extension on it', () => {
    expect(safeFileName('Back yard.jpeg', 'jpg')).toBe('Back yard.jpg');
    expect(safeFileName('sketch.exe', 'png')).toBe('sketch.png');
  });

  it('drops folders, quotes, control characters and leading dots', () => {
    expect(safeFileName('C:\\Users\\x\\..\\yard.png', 'png')).toBe('yard.png');
    expect(safeFileName('../../.hidden".png', 'png')).toBe('hidden_.png');
    expect(safeFileName('a\r\nb.png', 'png')).toBe('a_b.png');
    expect(safeFileName('', 'webp')).toBe('upload.webp');
    expect(safeFileName('Jardín trasero.png', 'png')).toBe('Jardin trasero.png');
  });

  it('keeps names short', () => {
    expect(safeFileName(`${'x'.repeat(300)}.png`, 'png')).toHaveLength(94);
  });
});
