// Money, days and quantities as a homeowner reads them (the customer pages have no session).

/** 123456 cents → "$1,234.56": the one money format (lib/money.ts), under the name these pages use. */
export { formatCents as formatMoney } from './money';

/** "2026-03-04" → "March 4, 2026" (a calendar day: no time zone may shift it). */
export function formatDay(day: string): string {
  return new Intl.DateTimeFormat('en-US', {
    timeZone: 'UTC',
    year: 'numeric',
    month: 'long',
    day: 'numeric',
  }).format(new Date(`${day.slice(0, 10)}T12:00:00Z`));
}

/** An instant in the reader's own time zone: "March 4, 2026 at 3:05 PM". */
export function formatMoment(iso: string, timeZone?: string): string {
  return new Intl.DateTimeFormat('en-US', {
    timeZone,
    dateStyle: 'long',
    timeStyle: 'short',
  }).format(new Date(iso));
}

// The price book's plural units that read wrong after a 1 ("1 days"); others ("sq ft", "box",
// "gal") read the same either way.
const pluralUnits = new Set([
  'days',
  'rolls',
  'loads',
  'bags',
  'tons',
  'hours',
  'pallets',
  'boxes',
]);

/** 12.5 and "tons" → "12.5 tons", 1 and "days" → "1 day": a quantity with its unit as said aloud. */
export function formatQuantity(quantity: number, unit: string): string {
  const amount = quantity.toLocaleString('en-US', { maximumFractionDigits: 2 });
  const said = quantity === 1 && pluralUnits.has(unit) ? unit.replace(/e?s$/, '') : unit;
  return `${amount} ${said}`;
}
