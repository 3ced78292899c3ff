/** A cut to pack: width across the roll (feet) and length in whole steps. */
export interface PackItem {
  readonly widthFt: number;
  readonly units: number;
}

/** Where one item sits in its piece: offsets across the width (ft) and along it (steps). */
export interface Placement {
  readonly piece: number;
  readonly acrossOffsetFt: number;
  readonly alongOffsetUnits: number;
}

/** A packing: piece lengths (steps) and one placement per item, in item order. */
export interface Packing {
  readonly pieceUnits: number[];
  readonly placements: Placement[];
  readonly totalUnits: number;
}

const FIT_TOLERANCE_FT = 1e-9;

interface FreeRect {
  piece: number;
  x: number;
  y: number;
  w: number;
  h: number;
}

type SplitRule = 'full-length-right' | 'full-width-top';

function packInOrder(
  items: readonly PackItem[],
  order: readonly number[],
  widthFt: number,
  rule: SplitRule,
): Packing {
  const pieceUnits: number[] = [];
  const placements: Placement[] = new Array<Placement>(items.length);
  let free: FreeRect[] = [];
  for (const index of order) {
    const item = items[index] as PackItem;
    let best = -1;
    let bestWaste = Infinity;
    free.forEach((rect, k) => {
      if (item.widthFt > rect.w + FIT_TOLERANCE_FT || item.units > rect.h) return;
      const waste = rect.w * rect.h - item.widthFt * item.units;
      if (waste < bestWaste) {
        bestWaste = waste;
        best = k;
      }
    });
    let rect: FreeRect;
    if (best >= 0) {
      rect = free[best] as FreeRect;
      free = free.filter((_, k) => k !== best);
    } else {
      pieceUnits.push(item.units);
      rect = { piece: pieceUnits.length - 1, x: 0, y: 0, w: widthFt, h: item.units };
    }
    placements[index] = { piece: rect.piece, acrossOffsetFt: rect.x, alongOffsetUnits: rect.y };
    const rightH = rule === 'full-length-right' ? rect.h : item.units;
    const topW = rule === 'full-length-right' ? item.widthFt : rect.w;
    const right = {
      piece: rect.piece,
      x: rect.x + item.widthFt,
      y: rect.y,
      w: rect.w - item.widthFt,
      h: rightH,
    };
    const top = {
      piece: rect.piece,
      x: rect.x,
      y: rect.y + item.units,
      w: topW,
      h: rect.h - item.units,
    };
    for (const next of [right, top]) if (next.w > FIT_TOLERANCE_FT && next.h > 0) free.push(next);
  }
  return { pieceUnits, placements, totalUnits: pieceUnits.reduce((sum, units) => sum + units, 0) };
}

/** Can any two items share a piece side by side? If not, packing cannot save anything. */
export function canShare(items: readonly PackItem[], widthFt: number): boolean {
  const widths = items.map((item) => item.widthFt).sort((a, b) => a - b);
  return (
    widths.length >= 2 &&
    (widths[0] as number) + (widths[1] as number) <= widthFt + FIT_TOLERANCE_FT
  );
}

/**
 * Offcut reuse as 2-D strip packing without rotation: items go into full-width pieces of the
 * roll, side by side across the width and end to end along free stretches (guillotine
 * splits, best-area fit). Several item orders and split rules are tried; the packing with
 * the fewest total steps wins (ties: fewer pieces, then the first tried). Deterministic.
 */
export function packCuts(items: readonly PackItem[], widthFt: number): Packing {
  const indices = items.map((_, i) => i);
  const byLength = [...indices].sort((a, b) => byDesc(items, a, b, 'units', 'widthFt'));
  const byWidth = [...indices].sort((a, b) => byDesc(items, a, b, 'widthFt', 'units'));
  const byArea = [...indices].sort(
    (a, b) => area(items[b] as PackItem) - area(items[a] as PackItem) || a - b,
  );
  let best: Packing | null = null;
  for (const order of [byLength, byWidth, byArea]) {
    for (const rule of ['full-length-right', 'full-width-top'] as const) {
      const packing = packInOrder(items, order, widthFt, rule);
      if (
        !best ||
        packing.totalUnits < best.totalUnits ||
        (packing.totalUnits === best.totalUnits &&
          packing.pieceUnits.length < best.pieceUnits.length)
      ) {
        best = packing;
      }
    }
  }
  return best ?? { pieceUnits: [], placements: [], totalUnits: 0 };
}

function area(item: PackItem): number {
  return item.widthFt * item.units;
}

function byDesc(
  items: readonly PackItem[],
  a: number,
  b: number,
  first: keyof PackItem,
  second: keyof PackItem,
): number {
  const x = items[a] as PackItem;
  const y = items[b] as PackItem;
  return y[first] - x[first] || y[second] - x[second] || a - b;
}
