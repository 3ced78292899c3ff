// One tier's lines as a table: description, quantity, unit, unit price, amount. Rows never
// split across pages; a table that runs on repeats its column heads on the next page.
import { formatMoney, formatQuantity } from './document-format.js';
import { ensureSpace, ink, measureText, newPage, textAt } from './document-layout.js';
import type { Layout } from './document-layout.js';
import type { EstimateDocumentLine } from './estimate-document.types.js';

interface Column {
  head: string;
  /** Offset from the left of the text area. */
  x: number;
  width: number;
  align: 'left' | 'right';
  cell: (line: EstimateDocumentLine, currency: string) => string;
}

const padding = { x: 4, y: 4 } as const;

function columnsFor(width: number): Column[] {
  const qty = 56;
  const unit = 48;
  const price = 78;
  const amount = 84;
  const description = width - qty - unit - price - amount;
  let x = 0;
  const next = (w: number): number => {
    const at = x;
    x += w;
    return at;
  };
  return [
    {
      head: 'Description',
      x: next(description),
      width: description,
      align: 'left',
      cell: (l) => l.label,
    },
    {
      head: 'Qty',
      x: next(qty),
      width: qty,
      align: 'right',
      cell: (l) => formatQuantity(l.quantity),
    },
    { head: 'Unit', x: next(unit), width: unit, align: 'left', cell: (l) => l.unit },
    {
      head: 'Unit price',
      x: next(price),
      width: price,
      align: 'right',
      cell: (l, currency) => formatMoney(l.unitPriceCents, currency),
    },
    {
      head: 'Amount',
      x: next(amount),
      width: amount,
      align: 'right',
      cell: (l, currency) => formatMoney(l.amountCents, currency),
    },
  ];
}

const headStyle = { font: 'semibold', size: 8, color: ink.muted } as const;
const cellStyle = { size: 9.5 } as const;

function writeHead(layout: Layout, columns: Column[]): void {
  const { doc } = layout;
  const height = measureText(layout, 'Qty', 100, headStyle) + 2 * padding.y;
  for (const column of columns)
    textAt(
      layout,
      column.head.toUpperCase(),
      layout.left + column.x + padding.x,
      layout.y + padding.y,
      column.width - 2 * padding.x,
      { ...headStyle, align: column.align },
    );
  layout.y += height;
  doc
    .save()
    .moveTo(layout.left, layout.y)
    .lineTo(layout.right, layout.y)
    .lineWidth(0.8)
    .strokeColor(ink.text)
    .stroke()
    .restore();
}

function rowHeight(layout: Layout, columns: Column[], cells: string[]): number {
  const heights = columns.map((column, index) =>
    measureText(layout, cells[index] ?? '', column.width - 2 * padding.x, cellStyle),
  );
  return Math.max(...heights) + 2 * padding.y;
}

/** The table's whole height on one page. */
export function linesTableHeight(
  layout: Layout,
  lines: readonly EstimateDocumentLine[],
  currency: string,
): number {
  const columns = columnsFor(layout.width);
  const headHeight = measureText(layout, 'Qty', 100, headStyle) + 2 * padding.y;
  return lines.reduce(
    (sum, line) =>
      sum +
      rowHeight(
        layout,
        columns,
        columns.map((column) => column.cell(line, currency)),
      ),
    headHeight,
  );
}

/**
 * Writes the table at the cursor and leaves the cursor under its last row; on a new page
 * it first writes `continued` ("Option 2 of 2: … (continued)") and the column heads again.
 */
export function writeLinesTable(
  layout: Layout,
  lines: readonly EstimateDocumentLine[],
  currency: string,
  continued: string,
): void {
  const { doc } = layout;
  const columns = columnsFor(layout.width);
  const headHeight = measureText(layout, 'Qty', 100, headStyle) + 2 * padding.y;
  const rows = lines.map((line) => columns.map((column) => column.cell(line, currency)));
  const firstHeight = rows[0] ? rowHeight(layout, columns, rows[0]) : 0;
  ensureSpace(layout, headHeight + firstHeight);
  writeHead(layout, columns);
  rows.forEach((cells, index) => {
    const height = rowHeight(layout, columns, cells);
    if (layout.y + height > layout.bottom) {
      newPage(layout);
      const style = { font: 'semibold', size: 10, color: ink.muted } as const;
      layout.y += textAt(layout, continued, layout.left, layout.y, layout.width, style) + 4;
      writeHead(layout, columns);
    }
    // Every other row is shaded very lightly: a reading aid that survives a grey print.
    if (index % 2 === 1)
      doc.save().rect(layout.left, layout.y, layout.width, height).fill(ink.shade).restore();
    columns.forEach((column, at) => {
      textAt(
        layout,
        cells[at] ?? '',
        layout.left + column.x + padding.x,
        layout.y + padding.y,
        column.width - 2 * padding.x,
        { ...cellStyle, align: column.align },
      );
    });
    layout.y += height;
  });
  doc
    .save()
    .moveTo(layout.left, layout.y)
    .lineTo(layout.right, layout.y)
    .lineWidth(0.5)
    .strokeColor(ink.rule)
    .stroke()
    .restore();
}
