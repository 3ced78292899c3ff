import type { AngleContext } from './evaluate-offset.js';
import { compareCandidates } from './evaluate-offset.js';
import { scoreOffset } from './score-offset.js';
import type { OffsetScore, SearchBound } from './score-offset.js';

/** Uniform offsets tried per direction, on top of the vertex-aligned ones. */
const GRID_STEPS = 12;
/** Most vertex-aligned offsets tried per direction (the sharpest extremes are kept). */
const MAX_EXTREMES = 24;
/** Halvings of the pattern search around the best offset. */
const REFINE_ROUNDS = 4;

function residueKey(offset: number, origin: number, widthFt: number): number {
  const residue = (((offset - origin) % widthFt) + widthFt) % widthFt;
  const key = Math.round(residue * 1e6);
  return key === Math.round(widthFt * 1e6) ? 0 : key;
}

/**
 * Vertices that are local extremes across the grain: where parts appear or vanish, or where
 * a yard edge runs with the grain. A boundary through one leaves no sliver there. Ranked by
 * how sharply the ring turns back (the across-grain travel of the two edges), sharpest
 * first, so noise wiggles on a long curve do not crowd out real corners.
 */
function extremeOffsets(context: AngleContext): number[] {
  const { u, ringStart } = context.polygon;
  const found: { at: number; weight: number }[] = [];
  for (let r = 0; r + 1 < ringStart.length; r += 1) {
    const start = ringStart[r] as number;
    const count = (ringStart[r + 1] as number) - start;
    for (let i = 0; i < count; i += 1) {
      const here = u[start + i] as number;
      const prev = u[start + ((i + count - 1) % count)] as number;
      const next = u[start + ((i + 1) % count)] as number;
      if ((here <= prev && here <= next) || (here >= prev && here >= next)) {
        const weight =
          here === prev || here === next
            ? Infinity
            : Math.min(Math.abs(prev - here), Math.abs(next - here));
        found.push({ at: here, weight });
      }
    }
  }
  return found
    .sort((a, b) => b.weight - a.weight || a.at - b.at)
    .slice(0, MAX_EXTREMES)
    .map((extreme) => extreme.at);
}

/**
 * Offsets worth trying, deduplicated modulo the roll width and in a fixed order (so ties
 * resolve the same way every time): vertex-aligned extremes, then a uniform grid.
 */
export function offsetCandidates(context: AngleContext): number[] {
  const { uMin } = context.polygon;
  const widthFt = context.rules.widthFt;
  const seen: number[] = [];
  const result: number[] = [];
  const grid = Array.from({ length: GRID_STEPS }, (_, k) => uMin + (k * widthFt) / GRID_STEPS);
  for (const offset of [...extremeOffsets(context), ...grid]) {
    const key = residueKey(offset, uMin, widthFt);
    if (seen.includes(key)) continue;
    seen.push(key);
    result.push(offset);
  }
  return result;
}

/** Sorts scores best first; ties keep their evaluation order. */
export function sortBest<T extends OffsetScore>(scores: T[]): T[] {
  return scores
    .map((score, order) => ({ score, order }))
    .sort((a, b) => compareCandidates(a.score, b.score) || a.order - b.order)
    .map(({ score }) => score);
}

/**
 * Scores every candidate offset with the fast scan, then refines around the best with a
 * shrinking pattern search (the turf bought is a step function of the offset, so this
 * looks for a better step nearby). Returns all scores, best first. `bound` carries the best
 * amount seen so far (also across directions) so that hopeless offsets skip packing.
 */
export function searchOffsets(
  context: AngleContext,
  bound: SearchBound = { units: Infinity },
): OffsetScore[] {
  const scores = offsetCandidates(context).map((offset) => scoreOffset(context, offset, bound));
  let best = sortBest(scores)[0];
  let step = context.rules.widthFt / GRID_STEPS / 2;
  for (let round = 0; best && round < REFINE_ROUNDS; round += 1, step /= 2) {
    for (const offset of [best.offset - step, best.offset + step]) {
      const score = scoreOffset(context, offset, bound);
      scores.push(score);
      if (compareCandidates(score, best) < 0) best = score;
    }
  }
  return sortBest(scores);
}
