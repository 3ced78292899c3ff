// The estimate document: `renderEstimatePdf(input)` → the PDF's bytes, rendered in a worker
// thread. The estimates module joins its saved estimates to `EstimateDocumentInput` with an
// adapter; this module knows nothing of the database or HTTP.
import { DocumentPool } from './document-pool.js';
import type { EstimateDocumentInput } from './estimate-document.types.js';
import type { InvoiceDocumentInput } from './invoice-document.types.js';
import type { StatementDocumentInput } from './statement-document.types.js';

export { DocumentPool, defaultDocumentPoolConfig } from './document-pool.js';
export type { DocumentPoolConfig } from './document-pool.js';
export { formatMoney, formatDocumentDate } from './document-format.js';
export { documentCancellationNotice } from './cancellation-notice-input.js';
export type * from './estimate-document.types.js';
export type * from './invoice-document.types.js';
export type * from './statement-document.types.js';

/**
 * One pool per process for callers that pass none. It starts its thread on first use and
 * piscina unrefs idle threads, so it never keeps a process (a script, a test) from exiting;
 * `closeDefaultDocumentPool()` ends it at shutdown.
 */
let defaultPool: DocumentPool | null = null;

/** Renders the estimate PDF off the event loop, in `pool` or the process's default pool. */
export function renderEstimatePdf(
  input: EstimateDocumentInput,
  pool: DocumentPool = (defaultPool ??= new DocumentPool()),
): Promise<Buffer> {
  return pool.render(input);
}

/** Renders an invoice PDF in the same pool as the estimates. */
export function renderInvoicePdf(
  input: InvoiceDocumentInput,
  pool: DocumentPool = (defaultPool ??= new DocumentPool()),
): Promise<Buffer> {
  return pool.renderInvoice(input);
}

/** Renders a customer statement in the same pool. */
export function renderStatementPdf(
  input: StatementDocumentInput,
  pool: DocumentPool = (defaultPool ??= new DocumentPool()),
): Promise<Buffer> {
  return pool.renderStatement(input);
}

export async function closeDefaultDocumentPool(): Promise<void> {
  const pool = defaultPool;
  defaultPool = null;
  await pool?.close();
}
