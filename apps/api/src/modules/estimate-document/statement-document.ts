// Builds the customer statement in the calling thread (only the document worker calls this,
// through the pool): header, bill-to, one row per invoice, payment and credit of the invoices
// still owing with the running balance, the aging line and the balance due. Greys only.
import { formatDocumentDate, formatMoney, joinLines } from './document-format.js';
import {
  createLayout,
  ensureSpace,
  ink,
  measureText,
  paragraph,
  rule,
  textAt,
} from './document-layout.js';
import type { Layout } from './document-layout.js';
import type { StatementDocumentInput } from './statement-document.types.js';

function writeTop(layout: Layout, input: StatementDocumentInput): void {
  const metaWidth = 200;
  let y = layout.y;
  y += textAt(layout, input.company.name, layout.left, y, layout.width - metaWidth - 16, {
    font: 'bold',
    size: 18,
  });
  const contact = joinLines(input.company.address, input.company.phone, input.company.email);
  if (contact)
    y += textAt(layout, contact, layout.left, y + 2, layout.width - metaWidth - 16, {
      size: 9.5,
      color: ink.muted,
    });
  const x = layout.right - metaWidth;
  let metaY = layout.y;
  metaY += textAt(layout, 'Statement', x, metaY, metaWidth, {
    align: 'right',
    font: 'bold',
    size: 18,
  });
  metaY += textAt(layout, `As of ${formatDocumentDate(input.issuedOn)}`, x, metaY + 2, metaWidth, {
    align: 'right',
    size: 9.5,
    color: ink.muted,
  });
  layout.y = Math.max(y, metaY) + 10;
  rule(layout, ink.text, 1.2, 12);
  const billTo = joinLines(
    input.customer.name,
    input.customer.billingAddress,
    input.customer.email,
  );
  paragraph(layout, 'BILL TO', { font: 'semibold', size: 8, color: ink.muted }, 2);
  paragraph(layout, billTo, { size: 10 }, 14);
}

/** Column x positions and widths: date, item, charges, credits, balance. */
function columnsOf(layout: Layout) {
  const money = 84;
  const date = 76;
  const item = layout.width - date - 3 * money;
  const x = layout.left;
  return [
    { x, width: date, align: 'left' as const },
    { x: x + date, width: item - 8, align: 'left' as const },
    { x: x + date + item, width: money, align: 'right' as const },
    { x: x + date + item + money, width: money, align: 'right' as const },
    { x: x + date + item + 2 * money, width: money, align: 'right' as const },
  ];
}

function writeRow(layout: Layout, cells: readonly string[], bold = false): void {
  const columns = columnsOf(layout);
  const style = { font: bold ? ('semibold' as const) : ('regular' as const), size: 9.5 };
  const height = Math.max(
    ...cells.map((cell, i) => measureText(layout, cell, columns[i]?.width ?? 80, style)),
  );
  ensureSpace(layout, height + 6);
  cells.forEach((cell, i) => {
    const column = columns[i];
    if (column)
      textAt(layout, cell, column.x, layout.y, column.width, { ...style, align: column.align });
  });
  layout.y += height + 5;
}

export function renderStatementDocument(input: StatementDocumentInput): Promise<Uint8Array> {
  const layout = createLayout(`Statement for ${input.customer.name}`, input.company.name);
  const chunks: Buffer[] = [];
  const done = new Promise<Uint8Array>((resolve, reject) => {
    layout.doc.on('data', (chunk: Buffer) => chunks.push(chunk));
    layout.doc.on('end', () => resolve(Buffer.concat(chunks)));
    layout.doc.on('error', reject);
  });
  writeTop(layout, input);
  const money = (cents: number) => (cents === 0 ? '' : formatMoney(cents, input.currency));
  writeRow(layout, ['Date', 'Item', 'Charges', 'Credits', 'Balance'], true);
  rule(layout, ink.rule, 0.6, 4);
  if (input.entries.length === 0) paragraph(layout, 'Nothing is owed. Thank you.', { size: 10 });
  for (const entry of input.entries)
    writeRow(layout, [
      formatDocumentDate(entry.date),
      entry.label,
      money(entry.chargeCents),
      money(entry.creditCents),
      formatMoney(entry.balanceCents, input.currency),
    ]);
  rule(layout, ink.text, 1, 8);
  const agingLine = input.aging
    .map((bucket) => `${bucket.label}: ${formatMoney(bucket.cents, input.currency)}`)
    .join('   ·   ');
  paragraph(layout, 'AGING', { font: 'semibold', size: 8, color: ink.muted }, 2);
  paragraph(layout, agingLine, { size: 9.5 }, 10);
  paragraph(
    layout,
    `Balance due: ${formatMoney(input.balanceCents, input.currency)}`,
    { font: 'bold', size: 12 },
    8,
  );
  paragraph(
    layout,
    'Listed: every invoice still owing, with the payments (net of refunds) and credit notes recorded against it.',
    { size: 8.5, color: ink.muted },
  );
  layout.doc.end();
  return done;
}
