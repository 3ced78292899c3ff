// The photo or sketch under an area's drawing: upload (checked by content), scale by two points
// a known distance apart, serve, remove. Writes lock the job like every area write; the file is
// written before the transaction and removed again if it fails, and an image that is replaced or
// removed leaves the disk only after its row is gone.
import type { Response } from 'express';
import type { AreaUnderlayView, UnderlayScaleData } from '@seamwright/shared';
import type { RequestContext } from '../../context.js';
import { inTransaction } from '../../db/sequelize.js';
import type { Tx } from '../../db/sequelize.js';
import type { ServiceDeps } from '../../deps.js';
import { notFound } from '../../errors.js';
import { checkImage } from '../uploads/image-check.js';
import { deleteUpload, findUpload, insertUpload } from '../uploads/uploads.repository.js';
import {
  prepareUpload,
  removeStoredFiles,
  sendStoredFile,
  withStoredFile,
} from '../uploads/uploads.service.js';
import { lockEditableJob } from './area-rules.js';
import { newUnderlay, scaledUnderlay, underlayViewOf } from './area-underlay.js';
import { findArea, updateAreaUnderlay } from './areas.repository.js';
import type { AreaRecord } from './areas.repository.js';

export const underlayUploadKind = 'area-underlay';
export const underlayField = 'file';

export interface UploadedFile {
  buffer: Buffer;
  size: number;
  originalname: string;
}

export function createAreaUnderlayService(deps: ServiceDeps) {
  const { sequelize, storage, logger } = deps;
  const logRemoveFailure = (error: unknown) =>
    logger.warn({ err: error }, 'a stored file could not be removed');

  async function areaOrNotFound(ctx: RequestContext, id: string): Promise<AreaRecord> {
    const area = await findArea(ctx, id);
    if (!area) throw notFound('Area');
    return area;
  }

  /** Inside `tx`: the job may change, and the area is read again under the job's lock. */
  async function lockArea(ctx: RequestContext, area: AreaRecord, tx: Tx) {
    await lockEditableJob(ctx, area.jobId, tx);
    const locked = await findArea(ctx, area.id, tx);
    if (!locked) throw notFound('Area');
    return locked;
  }

  function viewOrThrow(area: AreaRecord): AreaUnderlayView {
    const view = underlayViewOf(area);
    if (!view) throw notFound('Underlay');
    return view;
  }

  async function upload(
    ctx: RequestContext,
    id: string,
    file: UploadedFile | undefined,
  ): Promise<AreaUnderlayView> {
    const area = await areaOrNotFound(ctx, id);
    const image = await checkImage(file, underlayField);
    const prepared = prepareUpload(ctx, {
      kind: underlayUploadKind,
      buffer: file!.buffer,
      contentType: image.contentType,
      originalName: file!.originalname,
      extension: image.extension,
    });
    const replaced = await withStoredFile(storage, prepared, () =>
      inTransaction(sequelize, async (tx) => {
        const locked = await lockArea(ctx, area, tx);
        await insertUpload(ctx, prepared.values, tx);
        const underlay = newUnderlay(
          { ...image, originalName: prepared.values.originalName },
          (locked.input.area as { outer?: unknown } | undefined)?.outer,
        );
        await updateAreaUnderlay(ctx, id, prepared.values.id, underlay, tx);
        return dropUpload(ctx, locked.underlayUploadId, tx);
      }),
    );
    await removeStoredFiles(storage, replaced, logRemoveFailure);
    return viewOrThrow(await areaOrNotFound(ctx, id));
  }

  /** Deletes an upload's row inside `tx`; returns the storage keys to remove after commit. */
  async function dropUpload(
    ctx: RequestContext,
    uploadId: string | null,
    tx: Tx,
  ): Promise<string[]> {
    if (!uploadId) return [];
    const old = await findUpload(ctx, uploadId, tx);
    if (!old) return [];
    await deleteUpload(ctx, uploadId, tx);
    return [old.storageKey];
  }

  async function setScale(
    ctx: RequestContext,
    id: string,
    input: UnderlayScaleData,
  ): Promise<AreaUnderlayView> {
    const area = await areaOrNotFound(ctx, id);
    if (!area.underlay) throw notFound('Underlay');
    await inTransaction(sequelize, async (tx) => {
      const locked = await lockArea(ctx, area, tx);
      if (!locked.underlay || !locked.underlayUploadId) throw notFound('Underlay');
      await updateAreaUnderlay(
        ctx,
        id,
        locked.underlayUploadId,
        scaledUnderlay(locked.underlay, input),
        tx,
      );
    });
    return viewOrThrow(await areaOrNotFound(ctx, id));
  }

  async function send(ctx: RequestContext, id: string, res: Response): Promise<void> {
    const area = await areaOrNotFound(ctx, id);
    const upload = area.underlayUploadId ? await findUpload(ctx, area.underlayUploadId) : null;
    if (!upload) throw notFound('Underlay');
    await sendStoredFile(res, storage, upload);
  }

  async function remove(ctx: RequestContext, id: string): Promise<void> {
    const area = await areaOrNotFound(ctx, id);
    if (!area.underlayUploadId) throw notFound('Underlay');
    const removed = await inTransaction(sequelize, async (tx) => {
      const locked = await lockArea(ctx, area, tx);
      if (!locked.underlayUploadId) throw notFound('Underlay');
      await updateAreaUnderlay(ctx, id, null, null, tx);
      return dropUpload(ctx, locked.underlayUploadId, tx);
    });
    await removeStoredFiles(storage, removed, logRemoveFailure);
  }

  return { upload, setScale, send, remove, dropUpload };
}
