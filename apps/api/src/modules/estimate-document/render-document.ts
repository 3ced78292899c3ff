// Builds the whole estimate document in the calling thread. Only the document worker calls
// this (through the pool); request code calls renderEstimatePdf, which never blocks the
// event loop.
import { writeCancellationNotice } from './cancellation-section.js';
import { writeCautions } from './cautions-section.js';
import { createLayout } from './document-layout.js';
import type { EstimateDocumentInput } from './estimate-document.types.js';
import { writeHeader } from './header-section.js';
import { writePageFooters } from './page-footer.js';
import { writePlans } from './plan-section.js';
import { writeNotesAndSmallPrint, writeTiers } from './price-section.js';

/** The PDF's bytes. Page 1: header, lines, totals, small print; then plans, cautions, notice. */
export function renderEstimateDocument(input: EstimateDocumentInput): Promise<Uint8Array> {
  const title = `Estimate ${input.estimate.number} (version ${input.estimate.version}): ${input.jobTitle}`;
  const layout = createLayout(title, input.company.name);
  const chunks: Buffer[] = [];
  const done = new Promise<Uint8Array>((resolve, reject) => {
    layout.doc.on('data', (chunk: Buffer) => chunks.push(chunk));
    layout.doc.on('end', () => resolve(Buffer.concat(chunks)));
    layout.doc.on('error', reject);
  });
  writeHeader(layout, input);
  writeTiers(layout, input);
  writeNotesAndSmallPrint(layout, input);
  writePlans(layout, input);
  if (input.cautions.length > 0) {
    // Cautions follow the plans on their last page, or page 1 when there are no plans.
    layout.y += 6;
    writeCautions(layout, input.cautions);
  }
  if (input.cancellationNotice) writeCancellationNotice(layout, input.cancellationNotice);
  writePageFooters(layout, input);
  layout.doc.end();
  return done;
}
