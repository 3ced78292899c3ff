// Builds the whole invoice document in the calling thread (only the document worker calls this,
// through the pool). One page for the usual invoice: header, bill-to, lines, totals, payments,
// balance and due day, then notes and the small print with the rounding rule. Greys only.
import { formatDocumentDate, formatMoney, joinLines } from './document-format.js';
import {
  createLayout,
  ensureSpace,
  ink,
  pageSize,
  paragraph,
  rule,
  textAt,
} from './document-layout.js';
import type { Layout } from './document-layout.js';
import type { InvoiceDocumentInput } from './invoice-document.types.js';
import { writeLinesTable } from './lines-table.js';
import { paragraphsOf } from './price-section.js';

function writeTop(layout: Layout, input: InvoiceDocumentInput): void {
  const metaWidth = 200;
  const left = layout.width - metaWidth - 16;
  let y = layout.y;
  y += textAt(layout, input.company.name, layout.left, y, left, { font: 'bold', size: 18 });
  const contact = joinLines(input.company.address, input.company.phone, input.company.email);
  if (contact)
    y += 2 + textAt(layout, contact, layout.left, y + 2, left, { size: 9.5, color: ink.muted });
  const x = layout.right - metaWidth;
  const right = { align: 'right' as const };
  let metaY = layout.y;
  metaY += textAt(layout, input.title, x, metaY, metaWidth, { ...right, font: 'bold', size: 18 });
  const meta = [
    `No. ${input.reference}`,
    `Issued ${formatDocumentDate(input.issuedOn)}`,
    `Due ${formatDocumentDate(input.dueDate)}`,
  ].join('\n');
  metaY +=
    2 + textAt(layout, meta, x, metaY + 2, metaWidth, { ...right, size: 9.5, color: ink.muted });
  layout.y = Math.max(y, metaY) + 10;
  rule(layout, ink.text, 1.2, 12);
  const gap = 18;
  const column = (layout.width - 2 * gap) / 3;
  const columns: [string, string][] = [
    [
      'Bill to',
      joinLines(input.customer.name, input.customer.billingAddress, input.customer.email),
    ],
    ['Site', input.siteAddress],
    ['Job', input.jobTitle],
  ];
  const heights = columns.map(([label, body], index) => {
    const cx = layout.left + index * (column + gap);
    const h = textAt(layout, label.toUpperCase(), cx, layout.y, column, {
      font: 'semibold',
      size: 8,
      color: ink.muted,
    });
    return h + 2 + textAt(layout, body, cx, layout.y + h + 2, column, { size: 10 });
  });
  layout.y += Math.max(...heights) + 16;
}

interface Row {
  label: string;
  cents: number;
  strong?: boolean;
}

function writeRows(layout: Layout, rows: readonly Row[], currency: string): void {
  const width = 280;
  const x = layout.right - width;
  ensureSpace(layout, rows.length * 18 + 10);
  layout.y += 4;
  for (const row of rows) {
    const style = {
      font: row.strong ? ('bold' as const) : ('regular' as const),
      size: row.strong ? 12 : 10,
    };
    if (row.strong) {
      layout.doc
        .save()
        .moveTo(x, layout.y)
        .lineTo(layout.right, layout.y)
        .lineWidth(1)
        .strokeColor(ink.text)
        .stroke()
        .restore();
      layout.y += 3;
    }
    const h = textAt(layout, row.label, x, layout.y, width - 116, style);
    textAt(layout, formatMoney(row.cents, currency), x + width - 112, layout.y, 108, {
      ...style,
      align: 'right',
    });
    layout.y += Math.max(h, 12) + 4;
  }
  layout.y += 8;
}

function writeFooters(layout: Layout, input: InvoiceDocumentInput): void {
  const { doc } = layout;
  const range = doc.bufferedPageRange();
  const y = pageSize.height - 40;
  for (let index = 0; index < range.count; index += 1) {
    doc.switchToPage(range.start + index);
    doc
      .save()
      .moveTo(layout.left, y - 6)
      .lineTo(layout.right, y - 6)
      .lineWidth(0.5)
      .strokeColor(ink.faint)
      .stroke()
      .restore();
    doc.font('regular').fontSize(8).fillColor(ink.muted);
    doc.text(`${input.title} ${input.reference} · ${input.company.name}`, layout.left, y, {
      width: layout.width - 100,
      lineBreak: false,
      ellipsis: true,
    });
    doc.text(`Page ${index + 1} of ${range.count}`, layout.right - 90, y, {
      width: 90,
      align: 'right',
      lineBreak: false,
    });
  }
}

export function renderInvoiceDocument(input: InvoiceDocumentInput): Promise<Uint8Array> {
  const layout = createLayout(
    `${input.title} ${input.reference}: ${input.jobTitle}`,
    input.company.name,
  );
  const chunks: Buffer[] = [];
  const done = new Promise<Uint8Array>((resolve, reject) => {
    layout.doc.on('data', (chunk: Buffer) => chunks.push(chunk));
    layout.doc.on('end', () => resolve(Buffer.concat(chunks)));
    layout.doc.on('error', reject);
  });
  writeTop(layout, input);
  if (input.status === 'void')
    paragraph(
      layout,
      'VOID: this invoice was cancelled and is not payable.',
      { font: 'bold', size: 12 },
      8,
    );
  writeLinesTable(layout, input.lines, input.currency, `${input.reference} (continued)`);
  const rows: Row[] = [
    { label: 'Subtotal', cents: input.subtotalCents },
    { label: input.taxLabel, cents: input.taxCents },
    { label: 'Total', cents: input.totalCents, strong: true },
    ...input.payments.map((p) => ({
      label: `Paid ${formatDocumentDate(p.receivedOn)} (${p.method})`,
      cents: -p.amountCents,
    })),
    ...input.credits.map((c) => ({ label: `Credit ${c.label}`, cents: -c.amountCents })),
    { label: 'Balance due', cents: input.balanceCents, strong: true },
  ];
  writeRows(layout, rows, input.currency);
  const due =
    input.balanceCents > 0
      ? `Please pay ${formatMoney(input.balanceCents, input.currency)} by ${formatDocumentDate(input.dueDate)}.`
      : 'Nothing is owed on this invoice. Thank you.';
  paragraph(layout, due, { font: 'semibold', size: 10 }, 8);
  if (input.notes?.trim()) {
    for (const part of paragraphsOf(input.notes)) paragraph(layout, part, { size: 10 });
    layout.y += 4;
  }
  const small = { size: 8.5, color: ink.muted, lineGap: 1 } as const;
  paragraph(layout, 'TERMS AND ROUNDING', { font: 'semibold', size: 8, color: ink.muted }, 2);
  paragraph(layout, input.roundingRule, small, 3);
  writeFooters(layout, input);
  layout.doc.end();
  return done;
}
