import { z } from 'zod';

/**
 * A photo or sketch under an area's drawing (issue 7), and the limits every upload shares.
 * Frame: the image's pixels run x right and y down; the drawing's feet run x east and y north.
 * The image's top-left corner sits at `offsetFt`, turned `rotationDeg` counter-clockwise about
 * that corner, and one pixel is `feetPerPixel` feet long.
 */

/** The largest file any upload route accepts (multer's limit and the web's own check). */
export const maxUploadBytes = 10 * 1024 * 1024;

/** What an image upload may be, by its content (never by its name). */
export const imageContentTypes = ['image/jpeg', 'image/png', 'image/webp'] as const;
export type ImageContentType = (typeof imageContentTypes)[number];

export interface PixelPoint {
  x: number;
  y: number;
}

const finite = z.number({ error: 'Must be a number' }).refine(Number.isFinite, 'Must be finite');

const pixelPointSchema = z
  .object({
    x: finite.refine((v) => v >= 0, 'Must be on the image (0 or more)'),
    y: finite.refine((v) => v >= 0, 'Must be on the image (0 or more)'),
  })
  .strict();

/** `PUT /api/areas/:id/underlay/scale`: two points on the image, their distance, placement. */
export const underlayScaleInputSchema = z
  .object({
    a: pixelPointSchema,
    b: pixelPointSchema,
    distanceFt: finite.refine((v) => v > 0, 'The distance must be more than 0'),
    offsetFt: z.object({ x: finite, y: finite }).strict().optional(),
    rotationDeg: finite.refine((v) => v >= -360 && v <= 360, 'Between -360° and 360°').optional(),
    opacity: finite.refine((v) => v >= 0.05 && v <= 1, 'Between 0.05 and 1').optional(),
  })
  .strict()
  .superRefine((value, ctx) => {
    if (pixelDistance(value.a, value.b) < 1)
      ctx.addIssue({
        code: 'custom',
        path: ['b'],
        message: 'Pick two different points, at least one pixel apart',
      });
  });
export type UnderlayScaleInput = z.input<typeof underlayScaleInputSchema>;
export type UnderlayScaleData = z.output<typeof underlayScaleInputSchema>;

export interface UnderlayScale {
  a: PixelPoint;
  b: PixelPoint;
  distanceFt: number;
}

/** The underlay as the area view carries it; the image itself is at `url`. */
export interface AreaUnderlayView {
  uploadId: string;
  url: string;
  contentType: string;
  originalName: string;
  widthPx: number;
  heightPx: number;
  /** Null until two points and their distance are given. */
  feetPerPixel: number | null;
  scale: UnderlayScale | null;
  offsetFt: { x: number; y: number };
  rotationDeg: number;
  opacity: number;
}

export const defaultUnderlayOpacity = 0.5;

export function pixelDistance(a: PixelPoint, b: PixelPoint): number {
  return Math.hypot(b.x - a.x, b.y - a.y);
}

/**
 * Feet per image pixel from two points a known distance apart: the distance over the points'
 * pixel distance. Plain geometry; throws on points that coincide or a distance that is not > 0,
 * which the schema refuses before this is called.
 */
export function feetPerPixel(a: PixelPoint, b: PixelPoint, distanceFt: number): number {
  const pixels = pixelDistance(a, b);
  if (!(pixels > 0) || !(distanceFt > 0) || !Number.isFinite(distanceFt))
    throw new RangeError('Two distinct points and a distance above 0 are needed');
  return distanceFt / pixels;
}

export interface UnderlayPlacement {
  feetPerPixel: number;
  offsetFt: { x: number; y: number };
  rotationDeg: number;
}

/** Where an image pixel lands in the drawing's feet (x east, y north). */
export function underlayPixelToFeet(
  placement: UnderlayPlacement,
  p: PixelPoint,
): { x: number; y: number } {
  const t = (placement.rotationDeg * Math.PI) / 180;
  const u = p.x * placement.feetPerPixel;
  // Pixel rows run down the image, which is south in the drawing.
  const v = -p.y * placement.feetPerPixel;
  return {
    x: placement.offsetFt.x + u * Math.cos(t) - v * Math.sin(t),
    y: placement.offsetFt.y + u * Math.sin(t) + v * Math.cos(t),
  };
}

/** The image pixel under a point of the drawing (the inverse of `underlayPixelToFeet`). */
export function underlayFeetToPixel(
  placement: UnderlayPlacement,
  point: { x: number; y: number },
): PixelPoint {
  const t = (placement.rotationDeg * Math.PI) / 180;
  const dx = point.x - placement.offsetFt.x;
  const dy = point.y - placement.offsetFt.y;
  const u = dx * Math.cos(t) + dy * Math.sin(t);
  const v = -dx * Math.sin(t) + dy * Math.cos(t);
  return { x: u / placement.feetPerPixel, y: -v / placement.feetPerPixel };
}
