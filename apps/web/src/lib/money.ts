/**
 * Money shown and typed as people read it; amounts are integer cents everywhere (never floats
 * for sums). The estimating feature's price-book rates are millicents and keep their own helper.
 */

const formats = new Map<string, Intl.NumberFormat>();

function currencyFormat(currency: string): Intl.NumberFormat {
  let format = formats.get(currency);
  if (!format) {
    format = new Intl.NumberFormat('en-US', {
      style: 'currency',
      currency,
      minimumFractionDigits: 2,
      maximumFractionDigits: 2,
    });
    formats.set(currency, format);
  }
  return format;
}

/** 123456 → `$1,234.56` in the company currency. */
export function formatCents(cents: number, currency: string): string {
  // Dividing an integer by 100 only for display: the figure is exact to the cent.
  return currencyFormat(currency).format(cents / 100);
}

/** "1,234.5" or "$12" → cents (exact string arithmetic), or null when it is not plain money. */
export function parseCents(text: string): number | null {
  const cleaned = text.trim().replace(/^\$/, '').replace(/,/g, '');
  const match = /^(\d{1,9})(?:\.(\d{0,2}))?$/.exec(cleaned);
  if (!match) return null;
  return Number(match[1]) * 100 + Number((match[2] ?? '').padEnd(2, '0'));
}

/** 123456 → "1234.56", for an input's starting value. */
export function centsInputValue(cents: number): string {
  return `${Math.floor(cents / 100)}.${String(cents % 100).padStart(2, '0')}`;
}
