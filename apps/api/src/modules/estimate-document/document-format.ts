// Money and dates as the document prints them. Money goes from integer cents to a decimal
// string by integer arithmetic, and only that exact string reaches Intl.NumberFormat (which
// formats decimal strings without turning them into floats), so no amount is ever rounded here.

const moneyFormats = new Map<string, Intl.NumberFormat>();

function moneyFormat(currency: string): Intl.NumberFormat {
  let format = moneyFormats.get(currency);
  if (!format) {
    format = new Intl.NumberFormat('en-US', { style: 'currency', currency });
    moneyFormats.set(currency, format);
  }
  return format;
}

/** `123456` cents → `$1,234.56` (USD); a currency without minor units (JPY) prints cents as units. */
export function formatMoney(cents: number, currency: string): string {
  if (!Number.isSafeInteger(cents)) throw new RangeError(`Money must be whole cents, got ${cents}`);
  const format = moneyFormat(currency);
  const digits = format.resolvedOptions().maximumFractionDigits ?? 2;
  if (digits === 0) return format.format(`${cents}`);
  const magnitude = BigInt(Math.abs(cents));
  const scale = 10n ** BigInt(digits);
  const whole = magnitude / scale;
  const fraction = (magnitude % scale).toString().padStart(digits, '0');
  const decimal = `${cents < 0 ? '-' : ''}${whole}.${fraction}`;
  // A decimal string (ES2023 Intl.NumberFormat v3) is formatted exactly as written.
  return format.format(decimal as Intl.StringNumericLiteral);
}

const longDate = new Intl.DateTimeFormat('en-US', {
  timeZone: 'UTC',
  year: 'numeric',
  month: 'long',
  day: 'numeric',
});

/** `2027-01-15` → `January 15, 2027`. The date is a calendar day, so it is read and shown as UTC. */
export function formatDocumentDate(date: string): string {
  const match = /^(\d{4})-(\d{2})-(\d{2})$/.exec(date);
  if (!match) throw new RangeError(`A document date must be YYYY-MM-DD, got "${date}"`);
  return longDate.format(
    new Date(Date.UTC(Number(match[1]), Number(match[2]) - 1, Number(match[3]))),
  );
}

/** A quantity with thousands separators and at most two decimals. */
export function formatQuantity(value: number): string {
  return new Intl.NumberFormat('en-US', { maximumFractionDigits: 2 }).format(value);
}

/** The non-empty parts, trimmed, one per line (an address block, a contact block). */
export function joinLines(...parts: (string | null | undefined)[]): string {
  return parts
    .map((part) => part?.trim())
    .filter((part): part is string => Boolean(part))
    .join('\n');
}
