// Estimate documents, off the event loop: a piscina pool of worker threads of its own.
//
// Why not the planner's pool: a document is rendered when an estimate is sent or downloaded,
// while a customer or the office waits; queued behind a heavy layout it would wait up to the
// planner's budget for nothing. The two kinds of work also want different limits (a document
// takes well under a second and little memory; a plan may take seconds). The code follows
// planner-pool.ts (run-time budget through a "started" message, a counted queue, nice +10,
// a heap limit, tsx's loader in the worker), without the planner's input checks.
import { MessageChannel } from 'node:worker_threads';
import { Piscina } from 'piscina';
import { AppError } from '../../errors.js';
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
/** Same reasons as the planner: the event loop is scheduled first on a busy machine. */
const workerNiceIncrement = 10;
/** A document needs far less; a runaway one fails alone instead of taking the process down. */
const workerHeapMb = 256;

/**
 * Longest a document may wait for a thread: two budgets (the one ahead finishes or is
 * stopped), but never less than a fresh thread needs to start under tsx, which loads the
 * takeoff package and pdfkit (up to about 8 s measured on the shared 2-core machine).
 */
function queueWaitMs(budgetMs: number): number {
  return Math.max(2 * budgetMs, 20_000);
}

function workerExecArgv(): string[] {
  const inherited = process.execArgv;
  if (inherited.some((arg) => arg.includes('tsx'))) return inherited;
  return [...inherited, '--import', import.meta.resolve('tsx')];
}

function isAbort(error: unknown): boolean {
  return error instanceof Error && error.name === 'AbortError';
}

export class DocumentPool {
  readonly config: DocumentPoolConfig;
  /** Started on first use; idle threads do not keep the process alive (piscina unrefs them). */
  #piscina: Piscina<DocumentTask, Uint8Array> | null = null;
  #closed = false;
  /** Counted here: piscina's `maxQueue` does not limit tasks that carry an AbortSignal. */
  #inFlight = 0;

  constructor(config: DocumentPoolConfig = defaultDocumentPoolConfig) {
    this.config = config;
  }

  #pool(): Piscina<DocumentTask, Uint8Array> {
    this.#piscina ??= new Piscina<DocumentTask, Uint8Array>({
      filename: workerFile.href,
      minThreads: 0,
      maxThreads: this.config.threads,
      idleTimeout: 60_000,
      execArgv: workerExecArgv(),
      resourceLimits: { maxOldGenerationSizeMb: workerHeapMb },
      niceIncrement: workerNiceIncrement,
    });
    return this.#piscina;
  }

  #busy(): AppError {
    const seconds = Math.max(1, Math.ceil(this.config.budgetMs / 1000));
    return new AppError(
      'SERVICE_BUSY',
      'Documents are being prepared for other requests; try again in a few seconds',
      {
        headers: { 'Retry-After': String(seconds) },
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
    if (this.#closed || this.#inFlight >= this.config.threads + this.config.maxQueue)
      throw this.#busy();
    const { budgetMs } = this.config;
    const controller = new AbortController();
    const { port1, port2 } = new MessageChannel();
    let started = false;
    let timer = setTimeout(() => controller.abort(), queueWaitMs(budgetMs));
    port1.once('message', () => {
      started = true;
      clearTimeout(timer);
      timer = setTimeout(() => controller.abort(), budgetMs);
    });
    this.#inFlight += 1;
    try {
      const bytes = await this.#pool().run(
        { job, startedPort: port2 },
        { signal: controller.signal, transferList: [port2] },
      );
      return Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength);
    } catch (error) {
      if (this.#closed || (isAbort(error) && !started)) throw this.#busy();
      if (isAbort(error))
        throw new AppError(
          'INTERNAL',
          `The ${job.kind} document took longer than ${budgetMs / 1000} s and was stopped`,
        );
      throw error;
    } finally {
      this.#inFlight -= 1;
      clearTimeout(timer);
      port1.close();
    }
  }

  /** Stops the threads; running and queued documents are answered 503. */
  async close(): Promise<void> {
    this.#closed = true;
    const piscina = this.#piscina;
    this.#piscina = null;
    if (piscina) await piscina.destroy();
  }
}
