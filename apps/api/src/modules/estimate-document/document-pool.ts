// Estimate documents, off the event loop: a piscina pool of worker threads of its own.
//
// Why not the planner's pool: a document is rendered when an estimate is sent or downloaded,
// while a customer or the office waits; queued behind a heavy layout it would wait up to the
// planner's budget for nothing. The two kinds of work also want different limits (a document
// takes well under a second and little memory; a plan may take seconds). The thread mechanics
// (run-time budget, counted queue, nice +10, heap limit) are BudgetedPool's.
import { AppError } from '../../errors.js';
import { BudgetedPool } from '../../workers/budgeted-pool.js';
import type { DocumentJob, DocumentTask } from './document-task.js';
import type { EstimateDocumentInput } from './estimate-document.types.js';
import type { InvoiceDocumentInput } from './invoice-document.types.js';
import type { StatementDocumentInput } from './statement-document.types.js';

export interface DocumentPoolConfig {
  /** Worker threads. */
  readonly threads: number;
  /** Longest one document may take to render (ms) before its thread is ended. */
  readonly budgetMs: number;
  /** Documents that may wait for a free thread; one more is answered 503. */
  readonly maxQueue: number;
}

/**
 * One thread is plenty: the sample document with plans renders in about 0.5–0.7 s on the
 * shared 2-core machine under load, once the thread is warm. The budget is generous because a
 * fresh thread also loads pdfkit and the fonts (a few seconds on that machine); a document
 * past it is a bug, not a big estimate.
 */
export const defaultDocumentPoolConfig: DocumentPoolConfig = {
  threads: 1,
  budgetMs: 10_000,
  maxQueue: 16,
};

const workerFile = new URL('./document-worker.ts', import.meta.url);
/** A document needs far less; a runaway one fails alone instead of taking the process down. */
const workerHeapMb = 256;

export class DocumentPool {
  readonly config: DocumentPoolConfig;
  readonly #pool: BudgetedPool<DocumentTask, Uint8Array>;

  constructor(config: DocumentPoolConfig = defaultDocumentPoolConfig) {
    this.config = config;
    this.#pool = new BudgetedPool<DocumentTask, Uint8Array>(
      {
        workerFile,
        threads: config.threads,
        budgetMs: config.budgetMs,
        maxQueue: config.maxQueue,
        // Started on first use: most processes never render a document.
        minThreads: 0,
        heapMb: workerHeapMb,
        // A fresh thread loads the takeoff package and pdfkit: up to about 8 s measured on
        // the shared 2-core machine.
        minQueueWaitMs: 20_000,
      },
      {
        busy: (seconds) =>
          new AppError(
            'SERVICE_BUSY',
            'Documents are being prepared for other requests; try again in a few seconds',
            { headers: { 'Retry-After': String(seconds) } },
          ),
        overBudget: (budgetMs) =>
          new AppError(
            'INTERNAL',
            `The document took longer than ${budgetMs / 1000} s and was stopped`,
          ),
        outOfMemory: (heapMb) =>
          new AppError('INTERNAL', `The document needed more than ${heapMb} MB`),
      },
    );
  }

  /** Renders one estimate PDF in a worker thread. */
  render(input: EstimateDocumentInput): Promise<Buffer> {
    return this.#run({ kind: 'estimate', input });
  }

  /** Renders one invoice PDF in a worker thread (same pool, same limits). */
  renderInvoice(input: InvoiceDocumentInput): Promise<Buffer> {
    return this.#run({ kind: 'invoice', input });
  }

  renderStatement(input: StatementDocumentInput): Promise<Buffer> {
    return this.#run({ kind: 'statement', input });
  }

  async #run(job: DocumentJob): Promise<Buffer> {
    const bytes = await this.#pool.run({ job });
    return Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  }

  /** Stops the threads; running and queued documents are answered 503. */
  async close(): Promise<void> {
    await this.#pool.close();
  }
}
