/** A cut to place: width across the grain, length along it, and the roll its area was planned with. */
export interface PackJobItem {
  readonly acrossFt: number;
  readonly alongFt: number;
  readonly rollIndex: number;
}

/** A stock size: rolls for new pieces, remnants for pieces already in the yard. */
export interface PackStock {
  readonly rolls: readonly { readonly widthFt: number; readonly maxLengthFt: number }[];
  readonly remnants: readonly { readonly widthFt: number; readonly lengthFt: number }[];
}

/** A piece of a packing: a remnant (by index) or a new piece from a roll. */
export type PackedPiece =
  | { readonly kind: 'remnant'; readonly remnant: number }
  | {
      readonly kind: 'new';
      readonly rollIndex: number;
      readonly widthFt: number;
      readonly lengthFt: number;
    };

/** Where one item sits: its piece, and offsets from the piece's left edge and start (ft). */
export interface JobPlacement {
  readonly piece: number;
  readonly acrossOffsetFt: number;
  readonly alongOffsetFt: number;
}

/** A packing of all items: pieces used and one placement per item, in item order. */
export interface JobPacking {
  readonly pieces: PackedPiece[];
  readonly placements: JobPlacement[];
  readonly newSqFt: number;
}

/** How a packing run opens pieces and picks free space. */
export interface PackVariant {
  readonly order: 'length' | 'width' | 'area';
  readonly split: 'full-length-right' | 'full-width-top';
  /** Fill remnants before offcuts of new pieces, or simply the tightest fit. */
  readonly remnantsFirst: boolean;
  readonly useRemnants: boolean;
}

const FIT_FT = 1e-6;

interface FreeRect {
  readonly piece: number;
  readonly remnant: boolean;
  readonly x: number;
  readonly y: number;
  readonly w: number;
  readonly h: number;
}

function orderOf(items: readonly PackJobItem[], order: PackVariant['order']): number[] {
  const key = (item: PackJobItem): [number, number] =>
    order === 'length'
      ? [item.alongFt, item.acrossFt]
      : order === 'width'
        ? [item.acrossFt, item.alongFt]
        : [item.acrossFt * item.alongFt, item.alongFt];
  return items
    .map((_, i) => i)
    .sort((a, b) => {
      const [a1, a2] = key(items[a] as PackJobItem);
      const [b1, b2] = key(items[b] as PackJobItem);
      return b1 - a1 || b2 - a2 || a - b;
    });
}

function pickRect(free: readonly FreeRect[], item: PackJobItem, remnantsFirst: boolean): number {
  let best = -1;
  let bestKey = [Infinity, Infinity];
  free.forEach((rect, k) => {
    if (item.acrossFt > rect.w + FIT_FT || item.alongFt > rect.h + FIT_FT) return;
    const key = [
      remnantsFirst && !rect.remnant ? 1 : 0,
      rect.w * rect.h - item.acrossFt * item.alongFt,
    ];
    if (key[0]! < bestKey[0]! || (key[0] === bestKey[0] && key[1]! < bestKey[1]! - 1e-9)) {
      best = k;
      bestKey = key;
    }
  });
  return best;
}

/**
 * Packs every cut of a job into remnants and new full-width pieces: guillotine splits (each
 * placement cuts its free rectangle in two with one straight cut), cuts never turned (their
 * length runs along the piece's length), best-area fit. Any free space takes any cut that
 * fits, whichever area it is from; a new piece is opened in the roll the cut's area is laid
 * out for, as long as the cut. Deterministic for one variant.
 */
export function packJob(
  items: readonly PackJobItem[],
  stock: PackStock,
  variant: PackVariant,
): JobPacking {
  const pieces: PackedPiece[] = [];
  const placements = new Array<JobPlacement>(items.length);
  let free: FreeRect[] = [];
  if (variant.useRemnants) {
    stock.remnants.forEach((remnant, r) => {
      pieces.push({ kind: 'remnant', remnant: r });
      free.push({ piece: r, remnant: true, x: 0, y: 0, w: remnant.widthFt, h: remnant.lengthFt });
    });
  }
  for (const index of orderOf(items, variant.order)) {
    const item = items[index] as PackJobItem;
    const k = pickRect(free, item, variant.remnantsFirst);
    let rect: FreeRect;
    if (k >= 0) {
      rect = free[k] as FreeRect;
      free = free.filter((_, j) => j !== k);
    } else {
      const { rollIndex } = item;
      const widthFt = stock.rolls[rollIndex]?.widthFt ?? item.acrossFt;
      pieces.push({ kind: 'new', rollIndex, widthFt, lengthFt: item.alongFt });
      rect = { piece: pieces.length - 1, remnant: false, x: 0, y: 0, w: widthFt, h: item.alongFt };
    }
    placements[index] = { piece: rect.piece, acrossOffsetFt: rect.x, alongOffsetFt: rect.y };
    const tall = variant.split === 'full-length-right';
    const right = {
      ...rect,
      x: rect.x + item.acrossFt,
      w: rect.w - item.acrossFt,
      h: tall ? rect.h : item.alongFt,
    };
    const top = {
      ...rect,
      y: rect.y + item.alongFt,
      w: tall ? item.acrossFt : rect.w,
      h: rect.h - item.alongFt,
    };
    for (const next of [right, top]) if (next.w > FIT_FT && next.h > FIT_FT) free.push(next);
  }
  return compact(pieces, placements);
}

/** Drops remnants nothing was cut from and renumbers pieces in order of first use. */
function compact(pieces: PackedPiece[], placements: JobPlacement[]): JobPacking {
  const used = new Set(placements.map((placement) => placement.piece));
  const renumber = new Map<number, number>();
  const kept: PackedPiece[] = [];
  pieces.forEach((piece, i) => {
    if (!used.has(i)) return;
    renumber.set(i, kept.length);
    kept.push(piece);
  });
  const newSqFt = kept.reduce(
    (sum, piece) => (piece.kind === 'new' ? sum + piece.widthFt * piece.lengthFt : sum),
    0,
  );
  return {
    pieces: kept,
    placements: placements.map((p) => ({ ...p, piece: renumber.get(p.piece) as number })),
    newSqFt,
  };
}

/**
 * Every variant worth trying for a stock: item orders × split rules, with remnants (filled
 * first, or at the tightest fit) or without them.
 */
export function packVariants(stock: PackStock, useRemnants: boolean): PackVariant[] {
  const variants: PackVariant[] = [];
  const modes =
    useRemnants && stock.remnants.length > 0
      ? [
          { useRemnants: true, remnantsFirst: true },
          { useRemnants: true, remnantsFirst: false },
        ]
      : [{ useRemnants: false, remnantsFirst: false }];
  for (const mode of modes)
    for (const order of ['length', 'width', 'area'] as const)
      for (const split of ['full-length-right', 'full-width-top'] as const)
        variants.push({ order, split, ...mode });
  return variants;
}
