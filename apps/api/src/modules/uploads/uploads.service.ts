// The uploads module other modules use: prepare a checked file, store it and its row so that
// nothing is half-saved, remove it, and serve it back with safe headers. Generic: area
// underlays use it now, crew photos next (give them their own `kind`).
import { createHash, randomUUID } from 'node:crypto';
import type { Response } from 'express';
import type { RequestContext } from '../../context.js';
import { AppError } from '../../errors.js';
import { StoredFileMissingError } from './upload-storage.js';
import type { FileStorage } from './upload-storage.js';
import type { NewUpload, UploadRecord } from './uploads.repository.js';

/** A file checked by content and ready to store: its row's values and its bytes. */
export interface PreparedUpload {
  values: NewUpload;
  buffer: Buffer;
}

export function prepareUpload(
  ctx: RequestContext,
  input: {
    kind: string;
    buffer: Buffer;
    contentType: string;
    originalName: string;
    extension: string;
  },
): PreparedUpload {
  const id = randomUUID();
  return {
    buffer: input.buffer,
    values: {
      id,
      kind: input.kind,
      contentType: input.contentType,
      byteSize: input.buffer.length,
      sha256: createHash('sha256').update(input.buffer).digest('hex'),
      storageKey: `${ctx.companyId}/${id}`,
      originalName: safeFileName(input.originalName, input.extension),
    },
  };
}

/**
 * Writes the file, then runs `save` (the transaction that writes its row and whatever points at
 * it). If `save` fails the file is removed again, so no stored file is left without its row.
 */
export async function withStoredFile<T>(
  storage: FileStorage,
  prepared: PreparedUpload,
  save: () => Promise<T>,
): Promise<T> {
  await storage.put(prepared.values.storageKey, prepared.buffer);
  try {
    return await save();
  } catch (error) {
    await storage.delete(prepared.values.storageKey).catch(() => undefined);
    throw error;
  }
}

/** Removes stored files after their rows are gone (a failure leaves a file, never a row). */
export async function removeStoredFiles(
  storage: FileStorage,
  keys: readonly string[],
  onError: (error: unknown) => void,
): Promise<void> {
  for (const key of keys) await storage.delete(key).catch(onError);
}

/**
 * A name safe in a header and on any disk: no folders, only letters, digits, dot, dash,
 * underscore and space, at most 100 characters, and the extension of the checked content.
 */
export function safeFileName(original: string, extension: string): string {
  const base = (original.split(/[\\/]/).pop() ?? '')
    .replace(/\.[^.]*$/, '')
    .normalize('NFKD')
    // Accents come apart under NFKD; drop the marks so "Jardín" stays readable as "Jardin".
    .replace(/[\u0300-\u036f]/g, '')
    .replace(/[^A-Za-z0-9._ -]+/g, '_')
    .replace(/^[.\s_]+/, '')
    .slice(0, 90)
    .trim();
  return `${base || 'upload'}.${extension}`;
}

/**
 * Sends a stored file: the type checked at upload (never sniffed), inline under its safe name,
 * `nosniff`, and `private` so no shared cache keeps a company's photo.
 */
export async function sendStoredFile(
  res: Response,
  storage: FileStorage,
  upload: UploadRecord,
): Promise<void> {
  let stream;
  try {
    stream = await storage.get(upload.storageKey);
  } catch (error) {
    if (error instanceof StoredFileMissingError)
      throw new AppError('NOT_FOUND', 'The stored file is missing');
    throw error;
  }
  res.status(200);
  res.set({
    'Content-Type': upload.contentType,
    'Content-Length': String(upload.byteSize),
    'Content-Disposition': `inline; filename="${upload.originalName.replace(/"/g, '')}"`,
    'X-Content-Type-Options': 'nosniff',
    'Cache-Control': 'private, no-cache',
    ETag: `"${upload.sha256}"`,
  });
  await new Promise<void>((resolve, reject) => {
    stream.on('error', (error) => {
      res.destroy(error);
      reject(error);
    });
    res.on('finish', resolve);
    res.on('close', resolve);
    stream.pipe(res);
  });
}
