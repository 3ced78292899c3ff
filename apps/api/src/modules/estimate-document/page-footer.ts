// Every page's foot: which estimate it belongs to and "Page n of m", written once all pages
// exist (the document buffers its pages for this).
import { ink, pageSize } from './document-layout.js';
import type { Layout } from './document-layout.js';
import type { EstimateDocumentInput } from './estimate-document.types.js';

export function writePageFooters(layout: Layout, input: EstimateDocumentInput): void {
  const { doc } = layout;
  const range = doc.bufferedPageRange();
  const y = pageSize.height - 40;
  const left = `${input.company.name} · Estimate ${input.estimate.number}, version ${input.estimate.version}`;
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
    doc.text(left, layout.left, y, { width: layout.width - 90, lineBreak: false, ellipsis: true });
    doc.text(`Page ${index + 1} of ${range.count}`, layout.right - 90, y, {
      width: 90,
      align: 'right',
      lineBreak: false,
    });
  }
}
