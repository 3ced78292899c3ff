import type { AreaCandidate } from './area-candidates.js';
import { addSeams } from './job-rank.js';
import type { Figures } from './job-rank.js';
import { packJob, packVariants } from './pack-job.js';
import type { JobPacking, PackJobItem, PackStock, PackVariant } from './pack-job.js';

/** One choice of layout per area, packed: the cheapest packing found and the job's figures. */
export interface JobEvaluation {
  /** Index into each area's candidate list. */
  readonly choice: readonly number[];
  readonly candidates: readonly AreaCandidate[];
  readonly packing: JobPacking;
  /** True when the packing is each area's own pieces (the areas planned alone). */
  readonly alone: boolean;
  readonly figures: Figures;
  /** Cuts from new pieces of another width than their area is laid out for (a tie-break). */
  readonly mismatched: number;
}

const SQFT_TOLERANCE = 1e-6;

/** Each area's own pieces, side by side: what planning the areas one by one buys. */
export function alonePacking(candidates: readonly AreaCandidate[]): JobPacking {
  const pieces: JobPacking['pieces'] = [];
  const placements: JobPacking['placements'] = [];
  for (const candidate of candidates) {
    const first = pieces.length;
    for (const piece of candidate.plan.pieces)
      pieces.push({ kind: 'new', rollIndex: candidate.rollIndex, ...piece });
    for (const cut of candidate.plan.cuts)
      placements.push({
        piece: first + cut.piece,
        acrossOffsetFt: cut.acrossOffsetFt,
        alongOffsetFt: cut.alongOffsetFt,
      });
  }
  const newSqFt = candidates.reduce((sum, c) => sum + c.plan.orderedSqFt, 0);
  return { pieces, placements, newSqFt };
}

function betterPacking(a: JobPacking, b: JobPacking): boolean {
  if (Math.abs(a.newSqFt - b.newSqFt) > SQFT_TOLERANCE) return a.newSqFt < b.newSqFt;
  return a.pieces.length < b.pieces.length;
}

/**
 * Evaluates choices of one layout per area. Each choice is packed with every variant, and
 * competes with the areas' own pieces, so a job never buys more than its areas planned
 * alone. Results are memoised per choice.
 */
export class JobEvaluator {
  private readonly memo = new Map<string, JobEvaluation>();
  private readonly variants: PackVariant[];

  /**
   * With `withoutRemnants` (an evaluator of the same lists that ignores remnants), remnants
   * are used and its packing of each choice competes too, so listing remnants never makes a
   * choice worse; without it, remnants are ignored.
   */
  constructor(
    private readonly lists: readonly (readonly AreaCandidate[])[],
    private readonly stock: PackStock,
    private readonly withoutRemnants?: JobEvaluator,
  ) {
    this.variants = packVariants(stock, withoutRemnants !== undefined);
  }

  /** How many choices were packed so far. */
  get evaluated(): number {
    return this.memo.size;
  }

  evaluate(choice: readonly number[]): JobEvaluation {
    const key = choice.join(',');
    const known = this.memo.get(key);
    if (known) return known;
    const candidates = choice.map((c, area) => this.lists[area]?.[c] as AreaCandidate);
    const items: PackJobItem[] = candidates.flatMap((candidate) =>
      candidate.items.map((item) => ({ ...item, rollIndex: candidate.rollIndex })),
    );
    const plain = this.withoutRemnants?.evaluate(choice);
    let packing = plain ? plain.packing : alonePacking(candidates);
    let alone = plain ? plain.alone : true;
    for (const variant of this.variants) {
      const packed = packJob(items, this.stock, variant);
      if (betterPacking(packed, packing)) {
        packing = packed;
        alone = false;
      }
    }
    const figures: Figures = {
      orderedSqFt: packing.newSqFt,
      trafficSeamFt: candidates.reduce((sum, c) => sum + c.figures.trafficSeamFt, 0),
      seams: candidates.reduce((sum, c) => addSeams(sum, c.figures.seams), {
        count: 0,
        sideFt: 0,
        buttFt: 0,
      }),
    };
    const mismatched = items.filter((item, i) => {
      const piece = packing.pieces[packing.placements[i]?.piece ?? -1];
      return piece?.kind === 'new' && piece.rollIndex !== item.rollIndex;
    }).length;
    const evaluation = { choice: [...choice], candidates, packing, alone, figures, mismatched };
    this.memo.set(key, evaluation);
    return evaluation;
  }

  /** Every evaluation so far, in the order made. */
  all(): JobEvaluation[] {
    return [...this.memo.values()];
  }
}
