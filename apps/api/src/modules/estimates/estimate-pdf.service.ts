// The estimate's PDF, rendered off the event loop from the saved estimate.
import type { RequestContext } from '../../context.js';
import { renderEstimatePdf } from '../estimate-document/index.js';
import { getEstimateForDocument } from './estimate-document.service.js';
import { estimateNumber, toEstimateDocumentInput } from './estimate-document-input.js';

export interface EstimatePdf {
  pdf: Buffer;
  /** Letters, digits and dashes only, so it is safe in a header and on any disk. */
  filename: string;
}

export async function renderEstimatePdfOf(
  ctx: RequestContext,
  estimateId: string,
): Promise<EstimatePdf> {
  const doc = await getEstimateForDocument(ctx, estimateId);
  const pdf = await renderEstimatePdf(toEstimateDocumentInput(doc));
  const filename = `estimate-${estimateNumber(doc)}-v${doc.estimate.version}.pdf`.replace(
    /[^A-Za-z0-9.-]/g,
    '-',
  );
  return { pdf, filename };
}
