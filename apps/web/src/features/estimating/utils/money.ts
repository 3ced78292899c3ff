import { MILLICENTS_PER_UNIT } from '@seamwright/shared';

/** A price in millicents as money in the company currency, with sub-cent digits when present. */
export function formatPrice(millicents: number, currency: string): string {
  return new Intl.NumberFormat(undefined, {
    style: 'currency',
    currency,
    minimumFractionDigits: 2,
    maximumFractionDigits: 5,
  }).format(millicents / MILLICENTS_PER_UNIT);
}

/** "2.35" → 235000 (exact string arithmetic), or null when it is not a plain decimal. */
export function parsePrice(text: string): number | null {
  const match = /^(\d{1,9})(?:\.(\d{0,5}))?$/.exec(text.trim());
  if (!match) return null;
  return Number(match[1]) * MILLICENTS_PER_UNIT + Number((match[2] ?? '').padEnd(5, '0'));
}

/** 235000 → "2.35", for an input's starting value. */
export function priceInputValue(millicents: number): string {
  const whole = Math.floor(millicents / MILLICENTS_PER_UNIT);
  const fraction = String(millicents % MILLICENTS_PER_UNIT)
    .padStart(5, '0')
    .replace(/0+$/, '')
    .padEnd(2, '0');
  return `${whole}.${fraction}`;
}
