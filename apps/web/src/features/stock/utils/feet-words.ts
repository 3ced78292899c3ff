import { ApiError } from '../../../lib/api-error';
import type { Units } from '../../../lib/units';

/** `20 ft`, `12.5 ft`, `1,000 ft`: how the API writes a length in its messages. */
const feetInText = /(\d{1,3}(?:,\d{3})+|\d+)(\.\d+)? ft\b/g;

/**
 * The stock API names lengths in its messages as it stores them ("Jobs hold 20 ft of this
 * roll"); on screen every length goes through the company's units, so those figures are
 * rewritten (`20' 0"`, or `6.1 m` for a metric company).
 */
export function feetInWords(text: string, units: Units): string {
  return text.replace(feetInText, (_, whole: string, fraction: string | undefined) =>
    units.length(Number(`${whole.replace(/,/g, '')}${fraction ?? ''}`)),
  );
}

/** The same ApiError with its messages in the company's units; anything else unchanged. */
export function inCompanyUnits(error: unknown, units: Units): unknown {
  if (!(error instanceof ApiError)) return error;
  return new ApiError({
    status: error.status,
    code: error.code,
    title: error.message,
    detail: feetInWords(error.detail, units),
    errors: error.fieldErrors.map((e) => ({ ...e, message: feetInWords(e.message, units) })),
    requestId: error.requestId,
  });
}
