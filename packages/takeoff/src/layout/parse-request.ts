import { normalizeRing } from '../geometry/ring.js';
import type { Point } from '../geometry/types.js';
import { findRingProblem } from '../geometry/validate-rings.js';
import { LayoutInputError } from './errors.js';
import {
  MAX_COORDINATE_FT,
  MAX_PIECES_PER_STRIP,
  MAX_STRIPS,
  checkLayoutRequestSize,
  checkLengthStep,
} from './limits.js';
import { EDGE_TAGS } from './types.js';
import type { EdgeTag, LayoutRequest, TrafficPath } from './types.js';
import { readNumber, readOptionalNumber, requireArray, requireRecord } from './read-fields.js';

/** Walkway width when a traffic path gives none (feet; a common garden path, from memory). */
export const DEFAULT_WALKWAY_WIDTH_FT = 3;
/** Longest piece when the request gives none (feet; master rolls run about 100 ft, common practice). */
export const DEFAULT_MAX_LENGTH_FT = 100;

function readPoint(path: string, value: unknown): Point {
  if (!Array.isArray(value) || value.length !== 2)
    throw new LayoutInputError(path, 'must be a pair [x, y] of numbers');
  const x = readNumber(`${path}[0]`, value[0]);
  const y = readNumber(`${path}[1]`, value[1]);
  if (Math.abs(x) > MAX_COORDINATE_FT || Math.abs(y) > MAX_COORDINATE_FT) {
    throw new LayoutInputError(path, `is farther than ${MAX_COORDINATE_FT} ft from the origin`);
  }
  return [x, y];
}

function readRing(path: string, value: unknown): Point[] {
  const points = requireArray(path, value);
  const ring = normalizeRing(points.map((point, i) => readPoint(`${path}[${i}]`, point)));
  if (ring.length < 3) throw new LayoutInputError(path, 'needs at least 3 points');
  return ring;
}

function readTags(path: string, value: unknown, count: number): (EdgeTag | null)[] {
  const tags = requireArray(path, value);
  if (tags.length !== count)
    throw new LayoutInputError(path, `must have one tag per edge (${count})`);
  return tags.map((tag, i) => {
    if (tag === null || tag === undefined || tag === 'unknown') return null;
    if (typeof tag === 'string' && (EDGE_TAGS as readonly string[]).includes(tag))
      return tag as EdgeTag;
    throw new LayoutInputError(`${path}[${i}]`, `must be one of ${EDGE_TAGS.join(', ')} or null`);
  });
}

function readTrafficPath(path: string, value: unknown): TrafficPath {
  const isPlain = Array.isArray(value);
  const record = isPlain ? { points: value } : requireRecord(path, value);
  const pointsPath = isPlain ? path : `${path}.points`;
  const points = requireArray(pointsPath, record.points).map((p, i) =>
    readPoint(`${pointsPath}[${i}]`, p),
  );
  if (points.length < 2) throw new LayoutInputError(pointsPath, 'needs at least 2 points');
  const widthFt =
    readOptionalNumber(`${path}.widthFt`, record.widthFt, { positive: true }) ??
    DEFAULT_WALKWAY_WIDTH_FT;
  return { points, widthFt };
}

function readGrain(value: unknown): { angleDeg: number } | undefined {
  if (value === undefined || value === null) return undefined;
  const grain = requireRecord('grain', value);
  return { angleDeg: readNumber('grain.angleDeg', grain.angleDeg) };
}

/**
 * Validates an untrusted layout request (parsed JSON) and fills in defaults. Throws
 * {@link LayoutInputError} naming the first problem: a missing or non-numeric field, NaN or
 * Infinity, a ring with fewer than 3 points, a self-intersecting ring, a hole outside the
 * outer ring or overlapping another hole, edge tags that do not match the edges, or a
 * request past one of the limits in limits.ts (checked first, from array lengths alone).
 */
export function parseLayoutRequest(json: unknown): LayoutRequest {
  checkLayoutRequestSize(json);
  const body = requireRecord('request', json);
  const area = requireRecord('area', body.area);
  const outer = readRing('area.outer', area.outer);
  const holes = (
    area.holes === undefined || area.holes === null ? [] : requireArray('area.holes', area.holes)
  ).map((hole, i) => readRing(`area.holes[${i}]`, hole));
  const problem = findRingProblem(outer, holes);
  if (problem) throw new LayoutInputError(problem.path, problem.detail);
  const roll = requireRecord('roll', body.roll);
  const widthFt = readNumber('roll.widthFt', roll.widthFt, { positive: true });
  const lengthStepFt =
    readOptionalNumber('lengthStepFt', body.lengthStepFt, { positive: true }) ?? 1;
  checkLengthStep(lengthStepFt);
  const maxLengthFt =
    readOptionalNumber('roll.maxLengthFt', roll.maxLengthFt, { positive: true }) ??
    DEFAULT_MAX_LENGTH_FT;
  if (maxLengthFt < lengthStepFt)
    throw new LayoutInputError('roll.maxLengthFt', 'must be at least lengthStepFt');
  const trimAllowanceFt =
    readOptionalNumber('trimAllowanceFt', body.trimAllowanceFt, { nonNegative: true }) ?? 0;
  const [originX, originY] = outer[0] as Point;
  const span = Math.max(
    ...[outer, ...holes].flat().map(([x, y]) => Math.hypot(x - originX, y - originY)),
  );
  if ((2 * span) / widthFt > MAX_STRIPS) {
    throw new LayoutInputError(
      'roll.widthFt',
      `is too narrow for this area (more than ${MAX_STRIPS} strips)`,
    );
  }
  if ((2 * span) / maxLengthFt > MAX_PIECES_PER_STRIP) {
    throw new LayoutInputError(
      'roll.maxLengthFt',
      `is too short for this area (more than ${MAX_PIECES_PER_STRIP} pieces along one strip)`,
    );
  }
  const trafficPaths =
    body.trafficPaths === undefined || body.trafficPaths === null
      ? []
      : requireArray('trafficPaths', body.trafficPaths).map((p, i) =>
          readTrafficPath(`trafficPaths[${i}]`, p),
        );
  const edges =
    body.edges === undefined || body.edges === null
      ? undefined
      : readTags('edges', body.edges, outer.length);
  const holeEdges =
    body.holeEdges === undefined || body.holeEdges === null
      ? undefined
      : requireArray('holeEdges', body.holeEdges).map((tags, i) =>
          readTags(`holeEdges[${i}]`, tags, holes[i]?.length ?? 0),
        );
  return {
    area: { outer, holes },
    roll: { widthFt, maxLengthFt },
    grain: readGrain(body.grain),
    lengthStepFt,
    trimAllowanceFt,
    trafficPaths,
    edges,
    holeEdges,
  };
}
