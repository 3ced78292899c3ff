// Exact money arithmetic for estimates. Everything is integer cents (or millicents for the
// price book's per-unit rates); products are taken in BigInt so no intermediate value is ever
// a float or overflows 2^53, and rounding happens exactly where ESTIMATE_ROUNDING_RULE says.

/** 1 cent = 1,000 millicents (the price book's unit, see packages/shared/src/price-book.ts). */
export const MILLICENTS_PER_CENT = 1000;
/** 10,000 basis points = 100 %. */
export const BASIS_POINTS = 10_000;
/** Quantities are exact to this many decimal places (takeoff quantities have at most 2–4). */
export const QUANTITY_DECIMALS = 6;
const QUANTITY_SCALE = 10n ** BigInt(QUANTITY_DECIMALS);

/**
 * How estimates round, in one place (the PDF's small print quotes `sentence`).
 */
export const ESTIMATE_ROUNDING_RULE = {
  markup: 'per unit price',
  lineRounding: 'half-up to the cent, per line',
  tax: 'once, on the taxable subtotal, half-up to the cent',
  deposit:
    'percent of the total (tax included) rounded half-up, or a fixed amount; never more than the total',
  sentence:
    'Markup is applied to each unit price, which is rounded half-up to the cent; each line ' +
    '(quantity × unit price) is rounded half-up to the cent; tax is computed once on the ' +
    'taxable subtotal and rounded half-up to the cent; the deposit (a percent of the total ' +
    'rounded half-up, or a fixed amount, never more than the total) is part of the total.',
} as const;

export class MoneyInputError extends Error {
  constructor(
    readonly path: string,
    message: string,
  ) {
    super(`${path}: ${message}`);
    this.name = 'MoneyInputError';
  }
}

/** num / den rounded half-up (half away from zero for the non-negative values used here). */
export function divideHalfUp(num: bigint, den: bigint): bigint {
  if (den <= 0n) throw new RangeError('divideHalfUp: the divisor must be positive');
  if (num < 0n) return -divideHalfUp(-num, den);
  return (2n * num + den) / (2n * den);
}

/** A JS number as an exact count of millionths; more decimals than that are refused. */
export function quantityToMicros(quantity: number, path = 'quantity'): bigint {
  if (!Number.isFinite(quantity) || quantity < 0)
    throw new MoneyInputError(path, 'must be a number of at least 0');
  const micros = Math.round(quantity * 10 ** QUANTITY_DECIMALS);
  if (!Number.isSafeInteger(micros)) throw new MoneyInputError(path, 'is too large');
  // 2.35 * 1e6 is 2350000.0000000005; anything further off had more than 6 decimals.
  if (Math.abs(micros / 10 ** QUANTITY_DECIMALS - quantity) > 1e-9 * Math.max(1, quantity))
    throw new MoneyInputError(path, `use at most ${QUANTITY_DECIMALS} decimal places`);
  return BigInt(micros);
}

function toSafeNumber(value: bigint, path: string): number {
  const out = Number(value);
  if (!Number.isSafeInteger(out)) throw new MoneyInputError(path, 'amount is too large');
  return out;
}

function assertCents(value: number, path: string): void {
  if (!Number.isSafeInteger(value) || value < 0)
    throw new MoneyInputError(path, 'must be a whole number of cents, at least 0');
}

/** The unit price with markup, from the price book's millicents, half-up to the cent. */
export function markedUpUnitPriceCents(priceMillicents: number, markupBasisPoints: number): number {
  if (!Number.isSafeInteger(priceMillicents) || priceMillicents < 0)
    throw new MoneyInputError('priceMillicents', 'must be a whole number, at least 0');
  if (!Number.isSafeInteger(markupBasisPoints) || markupBasisPoints < 0)
    throw new MoneyInputError('markupBasisPoints', 'must be a whole number, at least 0');
  const num = BigInt(priceMillicents) * BigInt(BASIS_POINTS + markupBasisPoints);
  const den = BigInt(BASIS_POINTS) * BigInt(MILLICENTS_PER_CENT);
  return toSafeNumber(divideHalfUp(num, den), 'unitPriceCents');
}

/** quantity × unit price, half-up to the cent. */
export function lineAmountCents(quantity: number, unitPriceCents: number): number {
  assertCents(unitPriceCents, 'unitPriceCents');
  const num = quantityToMicros(quantity) * BigInt(unitPriceCents);
  return toSafeNumber(divideHalfUp(num, QUANTITY_SCALE), 'amountCents');
}

/** A basis-point share of an amount, half-up to the cent (tax, percent deposits). */
export function basisPointsOf(cents: number, basisPoints: number, path: string): number {
  assertCents(cents, path);
  if (!Number.isSafeInteger(basisPoints) || basisPoints < 0)
    throw new MoneyInputError(path, 'rate must be whole basis points, at least 0');
  return toSafeNumber(
    divideHalfUp(BigInt(cents) * BigInt(basisPoints), BigInt(BASIS_POINTS)),
    path,
  );
}
