import { sqFtToSqM, sqFtToSqYd, feetToMetres } from './conversions.js';
import type { MeasurementSystem } from './parse-length.js';

/** Smallest inch step shown by {@link formatFeetInches}. */
export type InchPrecision = 1 | 0.5 | 0.25 | 0.125 | 0.0625;

const numberFormats = new Map<number, Intl.NumberFormat>();

/** A number with thousands separators and at most `maxDecimals` decimals (en-US style). */
export function formatNumber(value: number, maxDecimals = 2): string {
  let format = numberFormats.get(maxDecimals);
  if (!format) {
    // signDisplay 'negative' keeps a value that rounds to zero from printing as "-0".
    format = new Intl.NumberFormat('en-US', {
      maximumFractionDigits: maxDecimals,
      signDisplay: 'negative',
    });
    numberFormats.set(maxDecimals, format);
  }
  return format.format(value);
}

function greatestCommonDivisor(a: number, b: number): number {
  return b === 0 ? a : greatestCommonDivisor(b, a % b);
}

/**
 * Feet as the trade writes them: `27' 6"`, `27' 6 1/2"`, `0' 3"`. The length is rounded to
 * the nearest `precisionIn` (default ½ in); 11 ⅞ in rounded to ½ in carries into the next foot.
 */
export function formatFeetInches(
  feet: number,
  options: { precisionIn?: InchPrecision } = {},
): string {
  if (!Number.isFinite(feet)) throw new RangeError(`Cannot format ${feet} as feet and inches`);
  const precision = options.precisionIn ?? 0.5;
  const steps = Math.round((Math.abs(feet) * 12) / precision);
  const stepsPerInch = Math.round(1 / precision);
  const stepsPerFoot = 12 * stepsPerInch;
  const wholeFeet = Math.floor(steps / stepsPerFoot);
  const restSteps = steps - wholeFeet * stepsPerFoot;
  const wholeInches = Math.floor(restSteps / stepsPerInch);
  const fractionSteps = restSteps - wholeInches * stepsPerInch;
  let inches = String(wholeInches);
  if (fractionSteps > 0) {
    const divisor = greatestCommonDivisor(fractionSteps, stepsPerInch);
    inches += ` ${fractionSteps / divisor}/${stepsPerInch / divisor}`;
  }
  const sign = feet < 0 && steps > 0 ? '-' : '';
  return `${sign}${formatNumber(wholeFeet, 0)}' ${inches}"`;
}

/** A length for the company's system: feet and inches, or metres with two decimals. */
export function formatLength(
  feet: number,
  options: { system: MeasurementSystem; precisionIn?: InchPrecision },
): string {
  if (options.system === 'metric') return `${formatNumber(feetToMetres(feet), 2)} m`;
  return formatFeetInches(
    feet,
    options.precisionIn === undefined ? {} : { precisionIn: options.precisionIn },
  );
}

/**
 * A stretch of length, as a cut sheet gives where a cut starts and ends: `0' 0"–15' 0"` for
 * imperial companies, `0–4.57 m` for metric ones (the unit once, after the second number).
 */
export function formatLengthRange(
  fromFeet: number,
  toFeet: number,
  options: { system: MeasurementSystem; precisionIn?: InchPrecision },
): string {
  if (options.system === 'metric')
    return `${formatNumber(feetToMetres(fromFeet), 2)}–${formatLength(toFeet, options)}`;
  return `${formatLength(fromFeet, options)}–${formatLength(toFeet, options)}`;
}

/** Area units {@link formatArea} can show. */
export type AreaUnit = 'sq ft' | 'sq yd' | 'm²';

/**
 * An area given in square feet, shown as `1,000 sq ft`, `111.11 sq yd` or `92.9 m²`. Without a
 * unit it uses sq ft for imperial companies and m² for metric ones.
 */
export function formatArea(
  sqFt: number,
  options: { system?: MeasurementSystem; unit?: AreaUnit; maxDecimals?: number } = {},
): string {
  const unit = options.unit ?? (options.system === 'metric' ? 'm²' : 'sq ft');
  const value = unit === 'sq yd' ? sqFtToSqYd(sqFt) : unit === 'm²' ? sqFtToSqM(sqFt) : sqFt;
  const decimals = options.maxDecimals ?? (unit === 'sq ft' ? 0 : 2);
  return `${formatNumber(value, decimals)} ${unit}`;
}
