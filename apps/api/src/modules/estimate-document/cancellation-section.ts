// The buyer's notice of cancellation (TRADE.md §8.2), only when the sale is covered. It starts
// on a page of its own, inside a heavy border, so it can be cut off, filled in and sent back.
import { ink, measureText, newPage, textAt } from './document-layout.js';
import type { Layout } from './document-layout.js';
import type { EstimateDocumentCancellationNotice } from './estimate-document.types.js';
import { paragraphsOf } from './price-section.js';

const pad = 14;

/** A dashed frame: a cut line around the part the buyer sends back. */
function frame(layout: Layout, top: number, height: number): void {
  layout.doc
    .save()
    .lineWidth(1.6)
    .strokeColor(ink.text)
    .dash(8, { space: 4 })
    .rect(layout.left, top, layout.width, height)
    .stroke()
    .restore();
}

export function writeCancellationNotice(
  layout: Layout,
  notice: EstimateDocumentCancellationNotice,
): void {
  newPage(layout);
  const x = layout.left + pad;
  const width = layout.width - 2 * pad;
  const blocks: { text: string; style: Parameters<typeof textAt>[5]; gap: number }[] = [
    { text: notice.heading ?? 'Notice of cancellation', style: { font: 'bold', size: 15 }, gap: 8 },
    { text: notice.endsOnText, style: { font: 'bold', size: 11 }, gap: 8 },
    ...(notice.statement
      ? [{ text: notice.statement, style: { font: 'semibold', size: 10 } as const, gap: 8 }]
      : []),
    ...paragraphsOf(notice.body).map((text) => ({ text, style: { size: 10 } as const, gap: 6 })),
    ...(notice.formLines ?? []).map((text, index) => ({
      text,
      style: { size: 10.5 } as const,
      gap: index === 0 ? 14 : 18,
    })),
  ];
  let y = layout.y + pad;
  for (const block of blocks) {
    // The notice is short enough for one page; past the bottom it goes on, framed per page.
    const height = measureText(layout, block.text, width, block.style);
    if (y + height > layout.bottom - pad) {
      frame(layout, layout.y, y - layout.y);
      newPage(layout);
      y = layout.y + pad;
    }
    y += textAt(layout, block.text, x, y, width, block.style) + block.gap;
  }
  frame(layout, layout.y, y - layout.y + pad - 4);
  layout.y = y + pad;
}
