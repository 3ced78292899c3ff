// The caution panel (DESIGN.md): a heavy bar down the left, a warning triangle and the word
// CAUTION, the caution's title and text, and the standing pointer to local codes and licensed
// practice at its end. The bar and triangle are black, so the panel reads the same in grey.
import { DEFER_TO_LOCAL_PRACTICE } from '@seamwright/takeoff';
import { ensureSpace, heading, ink, measureText, textAt } from './document-layout.js';
import type { Layout } from './document-layout.js';
import type { EstimateDocumentCaution } from './estimate-document.types.js';

const pad = 8;
const bar = 4;
const iconWidth = 22;

function warningTriangle(doc: PDFKit.PDFDocument, x: number, y: number): void {
  doc.save().lineWidth(1.4).lineJoin('round').strokeColor(ink.text);
  doc
    .moveTo(x + 8, y)
    .lineTo(x + 16, y + 14)
    .lineTo(x, y + 14)
    .closePath()
    .stroke();
  doc.rect(x + 7.3, y + 4.5, 1.4, 5).fill(ink.text);
  doc.rect(x + 7.3, y + 10.6, 1.4, 1.4).fill(ink.text);
  doc.restore();
}

function writeCaution(layout: Layout, caution: EstimateDocumentCaution): void {
  const { doc } = layout;
  const textX = layout.left + bar + pad + iconWidth;
  const width = layout.right - pad - textX;
  const title = `CAUTION  ·  ${caution.title}`;
  const body = caution.text.trim();
  // The pointer ends every caution once, also when the text given already carries it.
  const deferral = body.includes(DEFER_TO_LOCAL_PRACTICE) ? null : DEFER_TO_LOCAL_PRACTICE;
  const styles = {
    title: { font: 'bold', size: 10 } as const,
    body: { size: 9, lineGap: 1.2 } as const,
    deferral: { font: 'italic', size: 8, color: ink.muted } as const,
  };
  const heights = [
    measureText(layout, title, width, styles.title),
    measureText(layout, body, width, styles.body),
    deferral ? measureText(layout, deferral, width, styles.deferral) : 0,
  ];
  const height = heights.reduce((sum, h) => sum + h, 0) + 2 * pad + 6;
  ensureSpace(layout, height + 8);
  const top = layout.y;
  doc.save().rect(layout.left, top, layout.width, height).fill(ink.shade).restore();
  doc.save().rect(layout.left, top, bar, height).fill(ink.text).restore();
  warningTriangle(doc, layout.left + bar + pad - 2, top + pad);
  let y = top + pad;
  y += textAt(layout, title, textX, y, width, styles.title) + 3;
  y += textAt(layout, body, textX, y, width, styles.body) + 3;
  if (deferral) textAt(layout, deferral, textX, y, width, styles.deferral);
  layout.y = top + height + 8;
}

export function writeCautions(layout: Layout, cautions: readonly EstimateDocumentCaution[]): void {
  if (cautions.length === 0) return;
  heading(layout, 'Safety cautions for this job', 90, 13);
  for (const caution of cautions) writeCaution(layout, caution);
  layout.y += 6;
}
