// The priced part of page 1: each tier's lines and totals, then notes, validity and the small
// print (the rounding rule and the terms). Several tiers are options; the customer picks one.
import { formatDocumentDate, formatMoney } from './document-format.js';
import {
  ensureSpace,
  heading,
  ink,
  measureText,
  newPage,
  paragraph,
  textAt,
} from './document-layout.js';
import type { Layout } from './document-layout.js';
import { linesTableHeight, writeLinesTable } from './lines-table.js';
import type { EstimateDocumentInput, EstimateDocumentTier } from './estimate-document.types.js';

interface TotalRow {
  label: string;
  cents: number;
  strong?: boolean;
}

function totalRows(tier: EstimateDocumentTier): TotalRow[] {
  return [
    { label: 'Subtotal', cents: tier.subtotalCents },
    { label: 'Tax', cents: tier.taxCents },
    { label: 'Total', cents: tier.totalCents, strong: true },
    { label: 'Deposit due at signing', cents: tier.depositCents },
    // Whole cents minus whole cents: exact.
    { label: 'Balance on completion', cents: tier.totalCents - tier.depositCents },
  ];
}

const totalsWidth = 250;

function totalsHeights(layout: Layout, rows: readonly TotalRow[]): number[] {
  return rows.map(
    (row) => measureText(layout, row.label, totalsWidth, { size: row.strong ? 12 : 10 }) + 4,
  );
}

function writeTotals(layout: Layout, tier: EstimateDocumentTier, currency: string): void {
  const { doc } = layout;
  const width = totalsWidth;
  const x = layout.right - width;
  const rows = totalRows(tier);
  const heights = totalsHeights(layout, rows);
  ensureSpace(layout, heights.reduce((sum, h) => sum + h, 0) + 10);
  layout.y += 4;
  rows.forEach((row, index) => {
    const style = {
      font: row.strong ? ('bold' as const) : ('regular' as const),
      size: row.strong ? 12 : 10,
    };
    if (row.strong) {
      doc
        .save()
        .moveTo(x, layout.y)
        .lineTo(layout.right, layout.y)
        .lineWidth(1)
        .strokeColor(ink.text)
        .stroke()
        .restore();
      layout.y += 3;
    }
    textAt(layout, row.label, x, layout.y, width - 100, style);
    textAt(layout, formatMoney(row.cents, currency), x + width - 110, layout.y, 110 - 4, {
      ...style,
      align: 'right',
    });
    layout.y += heights[index] ?? 14;
  });
  layout.y += 10;
}

function tierHeading(tier: EstimateDocumentTier, index: number, count: number): string {
  if (count === 1) return tier.name || 'Work and materials';
  return `Option ${index + 1} of ${count}: ${tier.name}`;
}

export function writeTiers(layout: Layout, input: EstimateDocumentInput): void {
  const count = input.tiers.length;
  if (count > 1)
    paragraph(
      layout,
      `This estimate offers ${count} options. Each is priced in full; choose one of them when you accept.`,
      { size: 10, color: ink.muted },
      8,
    );
  input.tiers.forEach((tier, index) => {
    const title = tierHeading(tier, index, count);
    // A tier that fits on one page is never split: it starts on the next page instead.
    const height =
      measureText(layout, title, layout.width, { font: 'bold', size: 12 }) +
      4 +
      linesTableHeight(layout, tier.lines, input.currency) +
      totalsHeights(layout, totalRows(tier)).reduce((sum, h) => sum + h, 0) +
      20;
    if (layout.y + height > layout.bottom && height <= layout.bottom - layout.top) newPage(layout);
    heading(layout, title, 60, 12);
    writeLinesTable(layout, tier.lines, input.currency, `${title} (continued)`);
    writeTotals(layout, tier, input.currency);
  });
}

/** Splits typed text into paragraphs at blank lines. */
export function paragraphsOf(text: string | readonly string[]): string[] {
  const parts = typeof text === 'string' ? text.split(/\n\s*\n/) : [...text];
  return parts.map((part) => part.trim()).filter(Boolean);
}

export function writeNotesAndSmallPrint(layout: Layout, input: EstimateDocumentInput): void {
  if (input.notes?.trim()) {
    heading(layout, 'Notes', 30, 11);
    for (const part of paragraphsOf(input.notes)) paragraph(layout, part, { size: 10 });
    layout.y += 6;
  }
  const validity = `This estimate is valid until ${formatDocumentDate(input.validUntil)}. Prices after that date may change.`;
  paragraph(layout, validity, { font: 'semibold', size: 10 }, 8);

  const small = { size: 8.5, color: ink.muted, lineGap: 1 } as const;
  const parts = [input.roundingRule, ...(input.terms ? paragraphsOf(input.terms) : [])];
  const labelHeight = measureText(layout, 'TERMS', 100, { font: 'semibold', size: 8 });
  ensureSpace(layout, labelHeight + measureText(layout, parts[0] ?? '', layout.width, small) + 4);
  textAt(layout, 'TERMS AND ROUNDING', layout.left, layout.y, layout.width, {
    font: 'semibold',
    size: 8,
    color: ink.muted,
  });
  layout.y += labelHeight + 2;
  for (const part of parts) paragraph(layout, part, small, 3);
}
