import { compareCandidates, evaluateOffset } from './evaluate-offset.js';
import type { AngleContext, LayoutCandidate } from './evaluate-offset.js';

/** Uniform offsets tried per direction, on top of the vertex-aligned ones. */
const GRID_STEPS = 16;
/** Halvings of the pattern search around the best offsets. */
const REFINE_ROUNDS = 5;
/** How many of the best offsets are refined. */
const REFINE_SEEDS = 2;

function residueKey(offset: number, origin: number, widthFt: number): number {
  const residue = (((offset - origin) % widthFt) + widthFt) % widthFt;
  const key = Math.round(residue * 1e6);
  return key === Math.round(widthFt * 1e6) ? 0 : key;
}

/**
 * Offsets worth trying: through every vertex that is a local extreme across the grain (where
 * parts appear, vanish or a straight yard edge runs with the grain, so a boundary there leaves
 * no sliver), then a uniform grid over one roll width. Deduplicated modulo the width, in a
 * fixed order so ties resolve the same way every time.
 */
export function offsetCandidates(context: AngleContext): number[] {
  const { u, ringStart, uMin } = context.polygon;
  const widthFt = context.rules.widthFt;
  const seen = new Set<number>();
  const result: number[] = [];
  const add = (offset: number): void => {
    const key = residueKey(offset, uMin, widthFt);
    if (seen.has(key)) return;
    seen.add(key);
    result.push(offset);
  };
  const extremes: number[] = [];
  for (let r = 0; r + 1 < ringStart.length; r += 1) {
    const start = ringStart[r] as number;
    const count = (ringStart[r + 1] as number) - start;
    for (let i = 0; i < count; i += 1) {
      const here = u[start + i] as number;
      const prev = u[start + ((i + count - 1) % count)] as number;
      const next = u[start + ((i + 1) % count)] as number;
      if ((here <= prev && here <= next) || (here >= prev && here >= next)) extremes.push(here);
    }
  }
  extremes.sort((a, b) => a - b).forEach(add);
  for (let k = 0; k < GRID_STEPS; k += 1) add(uMin + (k * widthFt) / GRID_STEPS);
  return result;
}

function sortBest(candidates: LayoutCandidate[]): LayoutCandidate[] {
  return candidates
    .map((candidate, order) => ({ candidate, order }))
    .sort((a, b) => compareCandidates(a.candidate, b.candidate) || a.order - b.order)
    .map(({ candidate }) => candidate);
}

/**
 * Tries every candidate offset with the fast scan, then refines around the best few with a
 * shrinking pattern search (the turf bought is a step function of the offset, so the
 * refinement looks for a better step nearby). Returns all evaluated layouts, best first.
 */
export function searchOffsets(context: AngleContext): LayoutCandidate[] {
  const evaluated = offsetCandidates(context).map((offset) => evaluateOffset(context, offset));
  const seeds = sortBest(evaluated).slice(0, REFINE_SEEDS);
  for (const seed of seeds) {
    let best = seed;
    let step = context.rules.widthFt / GRID_STEPS / 2;
    for (let round = 0; round < REFINE_ROUNDS; round += 1, step /= 2) {
      for (const offset of [best.offset - step, best.offset + step]) {
        const candidate = evaluateOffset(context, offset);
        evaluated.push(candidate);
        if (compareCandidates(candidate, best) < 0) best = candidate;
      }
    }
  }
  return sortBest(evaluated);
}
