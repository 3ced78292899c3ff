// What crosses the thread boundary between the DocumentPool and its worker: plain data only.
import type { MessagePort } from 'node:worker_threads';
import type { EstimateDocumentInput } from './estimate-document.types.js';
import type { InvoiceDocumentInput } from './invoice-document.types.js';
import type { StatementDocumentInput } from './statement-document.types.js';

/** Which document to render: one pool serves every kind (estimates, invoices, statements). */
export type DocumentJob =
  | { readonly kind: 'estimate'; readonly input: EstimateDocumentInput }
  | { readonly kind: 'invoice'; readonly input: InvoiceDocumentInput }
  | { readonly kind: 'statement'; readonly input: StatementDocumentInput };

export interface DocumentTask {
  readonly job: DocumentJob;
  /** The worker posts one message here when it starts, so the budget counts run time only. */
  readonly startedPort: MessagePort;
}
