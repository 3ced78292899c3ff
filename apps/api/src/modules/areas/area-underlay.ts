// The underlay as stored on the area row (`job_areas.underlay`, JSON) and as the view shows it.
// The image's type, name and pixel size are copied here from its upload, so reading an area
// stays one statement.
import { defaultUnderlayOpacity, feetPerPixel } from '@seamwright/shared';
import type { AreaUnderlayView, UnderlayScaleData } from '@seamwright/shared';
import { AppError } from '../../errors.js';

export type StoredUnderlay = Omit<AreaUnderlayView, 'uploadId' | 'url'>;

export function underlayViewOf(record: {
  id: string;
  updatedAt: Date;
  underlayUploadId: string | null;
  underlay: StoredUnderlay | null;
}): AreaUnderlayView | null {
  if (!record.underlayUploadId || !record.underlay) return null;
  return {
    ...record.underlay,
    uploadId: record.underlayUploadId,
    // The upload id in the query makes a replaced image a new URL for the browser's cache.
    url: `/api/areas/${record.id}/underlay?v=${record.underlayUploadId}`,
  };
}

/** A new image starts unscaled, its top-left corner at the drawing's north-west corner. */
export function newUnderlay(
  image: { contentType: string; originalName: string; widthPx: number; heightPx: number },
  outer: unknown,
): StoredUnderlay {
  const points = Array.isArray(outer)
    ? outer.filter(
        (p): p is [number, number] =>
          Array.isArray(p) && typeof p[0] === 'number' && typeof p[1] === 'number',
      )
    : [];
  const xs = points.map((p) => p[0]);
  const ys = points.map((p) => p[1]);
  return {
    ...image,
    feetPerPixel: null,
    scale: null,
    offsetFt: { x: xs.length ? Math.min(...xs) : 0, y: ys.length ? Math.max(...ys) : 0 },
    rotationDeg: 0,
    opacity: defaultUnderlayOpacity,
  };
}

/** The two points must lie on the image; the distance and the rest the schema has checked. */
export function scaledUnderlay(current: StoredUnderlay, input: UnderlayScaleData): StoredUnderlay {
  const errors: { path: string; message: string }[] = [];
  for (const name of ['a', 'b'] as const) {
    if (input[name].x > current.widthPx)
      errors.push({
        path: `${name}.x`,
        message: `Must be on the image (at most ${current.widthPx})`,
      });
    if (input[name].y > current.heightPx)
      errors.push({
        path: `${name}.y`,
        message: `Must be on the image (at most ${current.heightPx})`,
      });
  }
  if (errors.length)
    throw new AppError(
      'VALIDATION_FAILED',
      errors.map((e) => `${e.path}: ${e.message}`).join('; '),
      {
        errors,
      },
    );
  return {
    ...current,
    feetPerPixel: feetPerPixel(input.a, input.b, input.distanceFt),
    scale: { a: input.a, b: input.b, distanceFt: input.distanceFt },
    offsetFt: input.offsetFt ?? current.offsetFt,
    rotationDeg: input.rotationDeg ?? current.rotationDeg,
    opacity: input.opacity ?? current.opacity,
  };
}
