// Estimate lines and tier totals. A tier is one option the customer can choose (e.g. two turf
// products); each has its own lines and totals, computed by ESTIMATE_ROUNDING_RULE.
import { basisPointsOf, lineAmountCents } from './money.js';

/** Where a line came from: the takeoff as priced, the takeoff edited by hand, or typed in. */
export type EstimateLineSource = 'takeoff' | 'manual-override' | 'manual';

export interface EstimateLineInput {
  id: string;
  /** The takeoff key (`turf`, `seam-tape`, …) or `manual` for typed lines. */
  key: string;
  label: string;
  quantity: number;
  unit: string;
  unitPriceCents: number;
  taxable: boolean;
  source: EstimateLineSource;
  /** The takeoff rule and how it was priced; kept when the line is edited by hand. */
  rule?: string;
  /** What the line is (`material`, `labour`, `turf`, …), for grouping. */
  kind?: string;
  priceBookItemId?: string | null;
  /** The computed figures a manual override replaced, so they stay visible. */
  computed?: { quantity: number; unitPriceCents: number };
}

export interface EstimateLine extends EstimateLineInput {
  amountCents: number;
}

export type EstimateDepositRule =
  { kind: 'percent'; basisPoints: number } | { kind: 'amount'; cents: number };

export interface EstimateRates {
  taxRateBasisPoints: number;
  depositRule: EstimateDepositRule;
}

export interface EstimateTotals {
  subtotalCents: number;
  taxableSubtotalCents: number;
  taxCents: number;
  /** Subtotal plus tax. */
  totalCents: number;
  /** Part of the total, due at acceptance. */
  depositCents: number;
}

export interface EstimateTierInput {
  id: string;
  name: string;
  /** The turf product every area is priced with in this tier; null: each area's own. */
  turfProductId: string | null;
  lines: EstimateLineInput[];
}

export interface EstimateTier extends EstimateTotals {
  id: string;
  name: string;
  turfProductId: string | null;
  lines: EstimateLine[];
}

export function priceLine(line: EstimateLineInput): EstimateLine {
  return { ...line, amountCents: lineAmountCents(line.quantity, line.unitPriceCents) };
}

/** The deposit a rule asks for on a total, never more than the total. */
export function depositFor(totalCents: number, rule: EstimateDepositRule): number {
  const wanted =
    rule.kind === 'percent'
      ? basisPointsOf(totalCents, rule.basisPoints, 'depositRule.basisPoints')
      : rule.cents;
  return Math.min(wanted, totalCents);
}

/** Totals of priced lines: lines summed, tax once on the taxable part, deposit inside the total. */
export function totalsOf(lines: readonly EstimateLine[], rates: EstimateRates): EstimateTotals {
  let subtotalCents = 0;
  let taxableSubtotalCents = 0;
  for (const line of lines) {
    subtotalCents += line.amountCents;
    if (line.taxable) taxableSubtotalCents += line.amountCents;
  }
  const taxCents = basisPointsOf(
    taxableSubtotalCents,
    rates.taxRateBasisPoints,
    'taxRateBasisPoints',
  );
  const totalCents = subtotalCents + taxCents;
  if (!Number.isSafeInteger(totalCents)) throw new RangeError('The estimate total is too large');
  return {
    subtotalCents,
    taxableSubtotalCents,
    taxCents,
    totalCents,
    depositCents: depositFor(totalCents, rates.depositRule),
  };
}

/** Prices every line of every tier and adds up each tier. */
export function computeEstimateTiers(
  tiers: readonly EstimateTierInput[],
  rates: EstimateRates,
): EstimateTier[] {
  return tiers.map((tier) => {
    const lines = tier.lines.map(priceLine);
    return {
      id: tier.id,
      name: tier.name,
      turfProductId: tier.turfProductId,
      lines,
      ...totalsOf(lines, rates),
    };
  });
}
