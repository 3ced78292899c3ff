// Metadata rows of stored files (table `uploads`, migration 0017), always through scoped().
import type { RequestContext } from '../../context.js';
import { UploadModel } from '../../db/models/index.js';
import type { Tx } from '../../db/sequelize.js';
import { scoped } from '../../db/tenant-scope.js';

export interface UploadRecord {
  id: string;
  kind: string;
  contentType: string;
  byteSize: number;
  sha256: string;
  storageKey: string;
  originalName: string;
  createdBy: string | null;
  createdAt: Date;
}

export type NewUpload = Omit<UploadRecord, 'createdAt' | 'createdBy'>;

export async function insertUpload(ctx: RequestContext, values: NewUpload, tx: Tx): Promise<void> {
  await scoped(ctx, UploadModel).create({ ...values, createdBy: ctx.userId }, tx);
}

export async function findUpload(
  ctx: RequestContext,
  id: string,
  tx?: Tx,
): Promise<UploadRecord | null> {
  const row = await scoped(ctx, UploadModel).findById(id, tx ? { tx } : {});
  return row
    ? {
        id: row.id,
        kind: row.kind,
        contentType: row.contentType,
        byteSize: row.byteSize,
        sha256: row.sha256,
        storageKey: row.storageKey,
        originalName: row.originalName,
        createdBy: row.createdBy,
        createdAt: row.createdAt,
      }
    : null;
}

export async function deleteUpload(ctx: RequestContext, id: string, tx: Tx): Promise<void> {
  await scoped(ctx, UploadModel).destroy({ id }, tx);
}
