// The domain's cancellation notice (@seamwright/domain, TRADE.md §8.2) as the document's
// input, so the estimates module passes what `cancellationNotice()` gives it unchanged.
import type { CancellationNotice } from '@seamwright/domain';
import type { EstimateDocumentCancellationNotice } from './estimate-document.types.js';

export function documentCancellationNotice(
  notice: CancellationNotice,
  endsOnText: string,
): EstimateDocumentCancellationNotice {
  return {
    endsOnText,
    heading: notice.heading,
    statement: notice.statement,
    body: notice.paragraphs,
    formLines: notice.formLines,
  };
}
