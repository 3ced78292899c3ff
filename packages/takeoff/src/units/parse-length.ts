import { METRES_PER_FOOT } from './conversions.js';

/** The company's measurement system; it decides what a bare number means. */
export type MeasurementSystem = 'imperial' | 'metric';

/** Why a length could not be read. */
export type LengthParseErrorCode =
  | 'empty'
  | 'negative'
  | 'unrecognised'
  | 'inches-out-of-range'
  | 'fractional-feet-with-inches'
  | 'bad-fraction'
  | 'mixed-systems';

/** A typed parse failure with a message fit to show beside the input field. */
export interface LengthParseError {
  code: LengthParseErrorCode;
  message: string;
}

/** The outcome of {@link parseLength}: feet, or the reason the text is not a length. */
export type LengthParseResult = { ok: true; feet: number } | { ok: false; error: LengthParseError };

type LengthUnit = 'ft' | 'in' | 'm' | 'cm' | 'mm';
interface Part {
  value: number;
  unit: LengthUnit | undefined;
  isFractional: boolean;
}

const UNIT_WORDS: Record<string, LengthUnit> = {
  "'": 'ft',
  ft: 'ft',
  foot: 'ft',
  feet: 'ft',
  '"': 'in',
  in: 'in',
  inch: 'in',
  inches: 'in',
  m: 'm',
  metre: 'm',
  metres: 'm',
  meter: 'm',
  meters: 'm',
  cm: 'cm',
  mm: 'mm',
};
const FEET_PER_UNIT: Record<LengthUnit, number> = {
  ft: 1,
  in: 1 / 12,
  m: 1 / METRES_PER_FOOT,
  cm: 1 / (100 * METRES_PER_FOOT),
  mm: 1 / (1000 * METRES_PER_FOOT),
};

// A number (decimal, whole + fraction like "6 1/2", or a bare fraction like "1/2") and an
// optional unit word or mark. Longer unit words come first so "inches" is not read as "in".
const PART =
  /\s*(\d+(?:,\d{3})*(?:\.\d*)?|\.\d+)(?:\s+(\d+)\/(\d+)|\/(\d+))?\s*(feet|foot|ft|inches|inch|in|metres|metre|meters|meter|mm|cm|m|'|")?\s*/y;

const fail = (code: LengthParseErrorCode, message: string): LengthParseResult => ({
  ok: false,
  error: { code, message },
});

/** Curly quotes, primes and doubled apostrophes become the plain feet and inch marks. */
function normalise(text: string): string {
  return text
    .trim()
    .toLowerCase()
    .replace(/[\u2032\u2019\u2018`´]/g, "'")
    .replace(/[\u2033\u201c\u201d]|''/g, '"');
}

function readParts(text: string): Part[] | LengthParseError {
  const parts: Part[] = [];
  PART.lastIndex = 0;
  while (PART.lastIndex < text.length) {
    const match = PART.exec(text);
    if (!match)
      return {
        code: 'unrecognised',
        message: `"${text}" is not a length; try 27' 6", 27 ft 6 in or 27.5`,
      };
    const [, whole = '', fracTop, fracBottom, bareBottom] = match;
    const wholeValue = Number(whole.replace(/,/g, ''));
    let value = wholeValue;
    if (bareBottom !== undefined) {
      if (Number(bareBottom) === 0)
        return { code: 'bad-fraction', message: 'A fraction cannot have 0 below the line' };
      value = wholeValue / Number(bareBottom);
    } else if (fracTop !== undefined && fracBottom !== undefined) {
      const top = Number(fracTop);
      const bottom = Number(fracBottom);
      if (bottom === 0 || top >= bottom || whole.includes('.')) {
        return {
          code: 'bad-fraction',
          message: `"${fracTop}/${fracBottom}" is not a proper fraction after a whole number`,
        };
      }
      value = wholeValue + top / bottom;
    }
    const mark = match[5];
    parts.push({
      value,
      unit: mark === undefined ? undefined : UNIT_WORDS[mark],
      isFractional: !Number.isInteger(value),
    });
  }
  return parts;
}

function combine(parts: Part[], system: MeasurementSystem): LengthParseResult {
  const [first, second] = parts;
  if (!first || parts.length > 2)
    return fail('unrecognised', 'Give one length, such as 27\' 6" or 8.4 m');
  if (!second) {
    const unit = first.unit ?? (system === 'metric' ? 'm' : 'ft');
    return { ok: true, feet: first.value * FEET_PER_UNIT[unit] };
  }
  if (first.unit !== 'ft' || (second.unit !== 'in' && second.unit !== undefined)) {
    const units = [first.unit, second.unit];
    const hasMetric = units.some((u) => u === 'm' || u === 'cm' || u === 'mm');
    const hasImperial = units.some((u) => u === 'ft' || u === 'in');
    if (hasMetric && hasImperial)
      return fail('mixed-systems', 'Use feet and inches or metres, not both');
    return fail(
      'unrecognised',
      'Write feet first, then inches, such as 27\' 6"; metric lengths take one unit, such as 8.4 m',
    );
  }
  if (first.isFractional) {
    return fail(
      'fractional-feet-with-inches',
      'Feet with a decimal cannot be followed by inches; write 27.5 or 27\' 6"',
    );
  }
  if (second.value >= 12) {
    const carry = first.value + Math.floor(second.value / 12);
    const rest = second.value % 12;
    return fail(
      'inches-out-of-range',
      `Inches must be less than 12 when feet are given (${second.value} in is ${Math.floor(second.value / 12)} ft ${rest} in); write ${carry}' ${rest}"`,
    );
  }
  return { ok: true, feet: first.value + second.value / 12 };
}

/**
 * Reads a length typed by a person and returns it in feet.
 *
 * Accepts `27' 6"`, `27'6"`, `27'6`, `27 ft 6 in`, `27ft`, `6 in`, `6"`, `27.5`, `27 1/2`,
 * `27' 6 1/2"`, `1,250 ft`, and metric `8.4 m`, `840 cm`, `250 mm`. A bare number means feet
 * for an imperial company and metres for a metric one; numbers with a unit mean what they say.
 * Rejects empty text, negatives, inches of 12 or more after feet, and anything else.
 */
export function parseLength(
  text: string,
  options: { system: MeasurementSystem },
): LengthParseResult {
  const cleaned = normalise(text);
  if (cleaned === '') return fail('empty', 'Enter a length');
  if (/^[-\u2212\u2013]/.test(cleaned)) return fail('negative', 'A length cannot be negative');
  if (/\d,\d{1,2}(?!\d)/.test(cleaned))
    return fail('unrecognised', 'Use a point for decimals, such as 8.4');
  const parts = readParts(cleaned);
  if (!Array.isArray(parts)) return { ok: false, error: parts };
  const result = combine(parts, options.system);
  if (result.ok && !Number.isFinite(result.feet))
    return fail('unrecognised', 'That number is too large to be a length');
  return result;
}
