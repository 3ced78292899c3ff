import { normalizeDegrees } from '../geometry/grain-frame.js';
import { LayoutInputError } from '../layout/errors.js';
import { readNumber, readOptionalNumber, requireRecord } from '../layout/read-fields.js';
import type { CompassFacing, JobGrain } from './types.js';

/**
 * The facing sides as directions, degrees counter-clockwise from east — the same convention
 * as `grain.angleDeg` and the compass helpers (geometry/compass.ts): "facing E" means the
 * blades lean toward the east side, so the roll's length runs toward +x (grain 0°).
 */
export const FACING_DEGREES: Readonly<Record<CompassFacing, number>> = {
  E: 0,
  NE: 45,
  N: 90,
  NW: 135,
  W: 180,
  SW: 225,
  S: 270,
  SE: 315,
};

const FACINGS = Object.keys(FACING_DEGREES) as CompassFacing[];

/**
 * Reads an area's `grain`: absent → free; `{ angleDeg }` → fixed; `{ facing, toleranceDeg }`
 * → the facing direction, turned at most `toleranceDeg` (0–180, default 0) either way.
 */
export function readJobGrain(path: string, value: unknown): JobGrain {
  if (value === undefined || value === null) return { kind: 'free' };
  const grain = requireRecord(path, value);
  const hasAngle = grain.angleDeg !== undefined && grain.angleDeg !== null;
  const hasFacing = grain.facing !== undefined && grain.facing !== null;
  if (hasAngle && hasFacing)
    throw new LayoutInputError(path, 'gives both angleDeg and facing; give one');
  if (hasAngle) return { kind: 'angle', angleDeg: readNumber(`${path}.angleDeg`, grain.angleDeg) };
  if (!hasFacing) throw new LayoutInputError(path, 'needs angleDeg or facing');
  const facing = grain.facing;
  if (typeof facing !== 'string' || !(FACINGS as string[]).includes(facing))
    throw new LayoutInputError(`${path}.facing`, `must be one of ${FACINGS.join(', ')}`);
  const toleranceDeg =
    readOptionalNumber(`${path}.toleranceDeg`, grain.toleranceDeg, { nonNegative: true }) ?? 0;
  if (toleranceDeg > 180) throw new LayoutInputError(`${path}.toleranceDeg`, 'must be at most 180');
  return {
    kind: 'facing',
    facing: facing as CompassFacing,
    centreDeg: FACING_DEGREES[facing as CompassFacing],
    toleranceDeg,
  };
}

/** Signed turn from `centreDeg` to `angleDeg`, in (-180, 180]. */
export function turnFrom(centreDeg: number, angleDeg: number): number {
  const turn = normalizeDegrees(angleDeg - centreDeg);
  return turn > 180 ? turn - 360 : turn;
}

/**
 * The grain direction (0–360) that lies within the facing range for an undirected layout
 * direction (the strip geometry is the same for θ and θ + 180°), or null when neither does.
 * Prefers the one nearer the facing.
 */
export function directedWithin(
  directionDeg: number,
  centreDeg: number,
  toleranceDeg: number,
): number | null {
  const options = [directionDeg, directionDeg + 180].map((angle) => ({
    angle: normalizeDegrees(angle),
    turn: Math.abs(turnFrom(centreDeg, angle)),
  }));
  const inside = options
    .filter((option) => option.turn <= toleranceDeg + 1e-9)
    .sort((a, b) => a.turn - b.turn);
  return inside[0]?.angle ?? null;
}
