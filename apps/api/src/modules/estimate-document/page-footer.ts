// Every page's foot: which estimate it belongs to and "Page n of m", written once all pages
// exist (the document buffers its pages for this).
import { ink, pageSize } from './document-layout.js';
import type { Layout } from './document-layout.js';
import type { EstimateDocumentInput } from './estimate-document.types.js';

/** `text` cut to fit `width` on one line, ending in an ellipsis when it was cut. */
function fitLine(doc: PDFKit.PDFDocument, text: string, width: number): string {
  if (doc.widthOfString(text) <= width) return text;
  let cut = text;
  while (cut.length > 1 && doc.widthOfString(`${cut}…`) > width) cut = cut.slice(0, -1);
  return `${cut.trimEnd()}…`;
}

export function writePageFooters(layout: Layout, input: EstimateDocumentInput): void {
  const { doc } = layout;
  const range = doc.bufferedPageRange();
  const y = pageSize.height - 40;
  // The estimate first: when the line is cut, the company name gives way.
  const left = `Estimate ${input.estimate.number}, version ${input.estimate.version} · ${input.company.name}`;
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
    doc.text(fitLine(doc, left, layout.width - 100), layout.left, y, { lineBreak: false });
    doc.text(`Page ${index + 1} of ${range.count}`, layout.right - 90, y, {
      width: 90,
      align: 'right',
      lineBreak: false,
    });
  }
}
