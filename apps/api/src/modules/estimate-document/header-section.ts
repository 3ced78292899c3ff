// Page 1's top: who sends the estimate (left), which estimate it is (right), then who it is
// for, where the work is and what the job is, in three columns.
import { formatDocumentDate, joinLines } from './document-format.js';
import { ink, rule, textAt } from './document-layout.js';
import type { Layout } from './document-layout.js';
import type { EstimateDocumentInput } from './estimate-document.types.js';

function writeCompany(layout: Layout, input: EstimateDocumentInput, width: number): number {
  const { company } = input;
  let y = layout.y;
  y += textAt(layout, company.name, layout.left, y, width, { font: 'bold', size: 18, lineGap: 0 });
  const contact = joinLines(company.address, joinLines(company.phone, company.email));
  if (contact)
    y += 2 + textAt(layout, contact, layout.left, y + 2, width, { size: 9.5, color: ink.muted });
  return y;
}

function writeEstimateMeta(layout: Layout, input: EstimateDocumentInput, width: number): number {
  const x = layout.right - width;
  let y = layout.y;
  const right = { align: 'right' as const };
  y += textAt(layout, 'Estimate', x, y, width, { ...right, font: 'bold', size: 18, lineGap: 0 });
  const meta = [
    `No. ${input.estimate.number} · version ${input.estimate.version}`,
    `Issued ${formatDocumentDate(input.issuedOn)}`,
    `Valid until ${formatDocumentDate(input.validUntil)}`,
  ].join('\n');
  y += 2 + textAt(layout, meta, x, y + 2, width, { ...right, size: 9.5, color: ink.muted });
  return y;
}

function writeColumn(layout: Layout, x: number, width: number, label: string, body: string) {
  const labelHeight = textAt(layout, label.toUpperCase(), x, layout.y, width, {
    font: 'semibold',
    size: 8,
    color: ink.muted,
  });
  return labelHeight + 2 + textAt(layout, body, x, layout.y + labelHeight + 2, width, { size: 10 });
}

export function writeHeader(layout: Layout, input: EstimateDocumentInput): void {
  const metaWidth = 190;
  const companyBottom = writeCompany(layout, input, layout.width - metaWidth - 16);
  const metaBottom = writeEstimateMeta(layout, input, metaWidth);
  layout.y = Math.max(companyBottom, metaBottom) + 10;
  rule(layout, ink.text, 1.2, 12);

  const gap = 18;
  const column = (layout.width - 2 * gap) / 3;
  const columns: [string, string][] = [
    ['Prepared for', joinLines(input.customer.name, input.customer.email)],
    ['Site', input.siteAddress],
    ['Job', input.jobTitle],
  ];
  const heights = columns.map(([label, body], index) =>
    writeColumn(layout, layout.left + index * (column + gap), column, label, body),
  );
  layout.y += Math.max(...heights) + 16;
}
