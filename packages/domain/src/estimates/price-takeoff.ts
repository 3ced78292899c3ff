// Turns a job's takeoff into estimate lines priced from the price book. Which price-book item
// prices which takeoff line is decided here, by key (see `priceKeysFor`), so the office can
// read it: a takeoff line with no item stays on the estimate at 0 with a warning naming it.
import type { EstimateLineInput } from './estimate-lines.js';
import { markedUpUnitPriceCents } from './money.js';

export interface PricingTakeoffLine {
  key: string;
  kind: string;
  label: string;
  quantity: number;
  unit: string;
  rule: string;
  areas: { areaName: string; turfProductId: string | null; quantity: number }[];
}

export interface PricingItem {
  id: string;
  kind: string;
  key: string;
  name: string;
  unit: string;
  packSize: number | null;
  priceMillicents: number;
  /** Labour items only: what the rate is per. */
  basis?: 'per_sq_ft' | 'per_seam_ft' | 'per_hour';
}

export interface PricingInput {
  lines: readonly PricingTakeoffLine[];
  items: readonly PricingItem[];
  markupBasisPoints: number;
  /** The job's measured area and seam length, for labour priced per sq ft or per seam ft. */
  measures: { areaSqFt: number; seamFt: number };
  /** Price all turf with this product (a tier); absent: each area with its own product. */
  turfProductId?: string | null;
}

export interface PricedTakeoff {
  lines: EstimateLineInput[];
  warnings: string[];
}

/** Takeoff lines that measure something another line prices (spoil by loads, stone by tons). */
export const UNPRICED_TAKEOFF_KEYS: readonly string[] = ['excavation-spoil', 'base-stone-volume'];

const aliases: Record<string, string[]> = {
  'base-stone-tons': ['base-stone'],
  'perimeter-nails': ['nails'],
  'seam-nails': ['nails'],
  edging: ['bender-board', 'edging'],
  'haul-loads': ['haul', 'roll-off', 'disposal'],
};

/** Price-book keys tried for a takeoff key, most specific first. */
export function priceKeysFor(takeoffKey: string): string[] {
  const tail = takeoffKey.includes(':') ? takeoffKey.slice(takeoffKey.indexOf(':') + 1) : null;
  return [takeoffKey, ...(aliases[takeoffKey] ?? []), ...(tail ? [tail] : [])];
}

/** The item a takeoff key is priced with: an exact key first, then a key with a suffix. */
export function findPriceItem(
  takeoffKey: string,
  items: readonly PricingItem[],
): PricingItem | undefined {
  const candidates = items.filter((item) => item.kind !== 'turf');
  for (const key of priceKeysFor(takeoffKey)) {
    const exact = candidates.find((item) => item.key === key);
    if (exact) return exact;
    const prefixed = candidates.find((item) => item.key.startsWith(`${key}-`));
    if (prefixed) return prefixed;
  }
  if (takeoffKey === 'haul-loads') return candidates.find((item) => item.kind === 'disposal');
  return undefined;
}

const round6 = (value: number) => Math.round(value * 1e6) / 1e6;
const money = (cents: number) => `$${(cents / 100).toFixed(2)}`;

function priceNote(item: PricingItem, unitPriceCents: number, markupBasisPoints: number): string {
  const markup = markupBasisPoints === 0 ? '' : ` with ${markupBasisPoints / 100} % markup`;
  return `priced as ${item.name} (${item.key}) at ${money(unitPriceCents)} per ${item.unit}${markup}`;
}

function turfLines(
  line: PricingTakeoffLine,
  input: PricingInput,
  ids: () => string,
): PricedTakeoff {
  const groups = new Map<string | null, { quantity: number; areas: string[] }>();
  for (const share of line.areas) {
    const productId = input.turfProductId === undefined ? share.turfProductId : input.turfProductId;
    const group = groups.get(productId) ?? { quantity: 0, areas: [] };
    group.quantity = round6(group.quantity + share.quantity);
    group.areas.push(share.areaName);
    groups.set(productId, group);
  }
  const out: PricedTakeoff = { lines: [], warnings: [] };
  for (const [productId, group] of groups) {
    const item = input.items.find((i) => i.id === productId && i.kind === 'turf');
    const where = `${group.areas.join(', ')}: ${group.quantity} ${line.unit} ordered`;
    const unitPriceCents = item
      ? markedUpUnitPriceCents(item.priceMillicents, input.markupBasisPoints)
      : 0;
    if (!item)
      out.warnings.push(
        productId === null
          ? `${line.label} (${group.areas.join(', ')}): no turf product chosen, priced at 0`
          : `${line.label} (${group.areas.join(', ')}): the turf product is no longer in the price book, priced at 0`,
      );
    out.lines.push({
      id: ids(),
      key: item ? `turf:${item.key}` : 'turf',
      kind: 'turf',
      label: item ? item.name : line.label,
      quantity: group.quantity,
      unit: line.unit,
      unitPriceCents,
      taxable: true,
      source: 'takeoff',
      rule: item ? `${where}; ${priceNote(item, unitPriceCents, input.markupBasisPoints)}` : where,
      priceBookItemId: item?.id ?? null,
    });
  }
  return out;
}

/** Quantity and unit in what the item is sold by: loose counts go into whole packs. */
function quantityFor(
  line: PricingTakeoffLine,
  item: PricingItem,
  input: PricingInput,
): { quantity: number; unit: string; note?: string } {
  if (item.kind === 'labour' && item.basis === 'per_sq_ft')
    return {
      quantity: round6(input.measures.areaSqFt),
      unit: 'sq ft',
      note: `${input.measures.areaSqFt} sq ft of area`,
    };
  if (item.kind === 'labour' && item.basis === 'per_seam_ft')
    return {
      quantity: round6(input.measures.seamFt),
      unit: 'seam ft',
      note: `${input.measures.seamFt} ft of seams`,
    };
  if (line.unit === 'ea' && item.packSize !== null && item.unit !== 'ea') {
    const packs = Math.ceil(line.quantity / item.packSize);
    return {
      quantity: packs,
      unit: item.unit,
      note: `${line.quantity} ea in ${item.unit}s of ${item.packSize}, rounded up`,
    };
  }
  return { quantity: line.quantity, unit: line.unit };
}

/** Labour with no item of its own is priced by the crew hour, when the book has one. */
function itemFor(line: PricingTakeoffLine, items: readonly PricingItem[]): PricingItem | undefined {
  const own = findPriceItem(line.key, items);
  if (own) return own;
  if (line.kind === 'labour' && line.unit === 'hours')
    return items.find((i) => i.kind === 'labour' && i.basis === 'per_hour');
  return undefined;
}

/**
 * The estimate lines for a takeoff: notes and guidance are left out, turf is priced per
 * product (one line per product), everything else by the item `findPriceItem` finds.
 */
export function priceTakeoff(input: PricingInput, ids: () => string): PricedTakeoff {
  const out: PricedTakeoff = { lines: [], warnings: [] };
  for (const line of input.lines) {
    if (line.kind === 'note' || line.kind === 'guidance') continue;
    if (UNPRICED_TAKEOFF_KEYS.includes(line.key)) continue;
    if (line.key === 'turf') {
      const turf = turfLines(line, input, ids);
      out.lines.push(...turf.lines);
      out.warnings.push(...turf.warnings);
      continue;
    }
    const item = itemFor(line, input.items);
    if (!item) {
      out.warnings.push(`${line.label} (${line.key}): no price in the price book, priced at 0`);
      out.lines.push({
        id: ids(),
        key: line.key,
        kind: line.kind,
        label: line.label,
        quantity: line.quantity,
        unit: line.unit,
        unitPriceCents: 0,
        taxable: true,
        source: 'takeoff',
        rule: line.rule,
        priceBookItemId: null,
      });
      continue;
    }
    const unitPriceCents = markedUpUnitPriceCents(item.priceMillicents, input.markupBasisPoints);
    const { quantity, unit, note } = quantityFor(line, item, input);
    const notes = [
      line.rule,
      ...(note ? [note] : []),
      priceNote(item, unitPriceCents, input.markupBasisPoints),
    ];
    out.lines.push({
      id: ids(),
      key: line.key,
      kind: line.kind,
      label: line.kind === 'labour' || line.kind === 'equipment' ? item.name : line.label,
      quantity,
      unit,
      unitPriceCents,
      taxable: true,
      source: 'takeoff',
      rule: notes.join('; '),
      priceBookItemId: item.id,
    });
  }
  return out;
}
