// Heavy work off the event loop: a piscina pool of worker threads with a run-time budget per
// task, a counted queue and a lower OS priority. The planner and the document renderer each own
// one (their limits differ: a plan may take seconds, a document well under one) and only say
// what their errors mean; the thread mechanics live here once.
import { MessageChannel } from 'node:worker_threads';
import type { MessagePort } from 'node:worker_threads';
import { Piscina } from 'piscina';

/** Every task carries this port; the worker posts one message on it when it starts. */
export interface StartedSignal {
  readonly startedPort: MessagePort;
}

export interface BudgetedPoolOptions {
  /** The worker module (its default export takes the task). */
  readonly workerFile: URL;
  readonly threads: number;
  /** Longest one task may RUN (ms) before its thread is ended; waiting does not count. */
  readonly budgetMs: number;
  /** Tasks that may wait for a free thread; one more is refused at once. */
  readonly maxQueue: number;
  /** Threads kept started (1: the first request does not wait for a thread to load). */
  readonly minThreads: number;
  /** Heap per thread: a runaway task fails alone instead of taking the process down. */
  readonly heapMb: number;
  /**
   * Shortest time a task may wait for a thread, whatever the budget: a fresh thread needs a
   * few seconds to load its code under tsx on a busy machine.
   */
  readonly minQueueWaitMs: number;
}

/** How a pool's owner words each way a task can fail for want of threads or time. */
export interface BudgetedPoolErrors {
  busy(retryAfterSeconds: number): Error;
  overBudget(budgetMs: number): Error;
  outOfMemory(heapMb: number): Error;
}

/**
 * Worker threads run at a lower OS priority (Linux nice +10, through piscina), so on a busy
 * machine the event loop that answers every other request is scheduled first.
 */
const workerNiceIncrement = 10;

/**
 * Worker threads inherit the parent's execArgv. Under `tsx` that already loads the
 * TypeScript loader; under vitest it does not, so the worker adds tsx's loader itself.
 */
function workerExecArgv(): string[] {
  const inherited = process.execArgv;
  if (inherited.some((arg) => arg.includes('tsx'))) return inherited;
  return [...inherited, '--import', import.meta.resolve('tsx')];
}

function isAbort(error: unknown): boolean {
  return error instanceof Error && error.name === 'AbortError';
}

function isOutOfMemory(error: unknown): boolean {
  return error instanceof Error && (error as { code?: string }).code === 'ERR_WORKER_OUT_OF_MEMORY';
}

export class BudgetedPool<Task extends StartedSignal, Result> {
  readonly options: BudgetedPoolOptions;
  readonly #errors: BudgetedPoolErrors;
  /** Started on first use, so an app that never needs it (most API tests) starts no threads. */
  #piscina: Piscina<Task, Result> | null = null;
  #closed = false;
  /**
   * Tasks running or waiting. Counted here because piscina keeps tasks that carry an
   * AbortSignal in a side queue its own `maxQueue` does not limit.
   */
  #inFlight = 0;

  constructor(options: BudgetedPoolOptions, errors: BudgetedPoolErrors) {
    this.options = options;
    this.#errors = errors;
  }

  #pool(): Piscina<Task, Result> {
    this.#piscina ??= new Piscina<Task, Result>({
      filename: this.options.workerFile.href,
      minThreads: this.options.minThreads,
      maxThreads: this.options.threads,
      idleTimeout: 60_000,
      execArgv: workerExecArgv(),
      resourceLimits: { maxOldGenerationSizeMb: this.options.heapMb },
      niceIncrement: workerNiceIncrement,
    });
    return this.#piscina;
  }

  /** Tasks running or waiting for a thread right now. */
  get tasksInFlight(): number {
    return this.#inFlight;
  }

  /** Seconds a refused client should wait: about one budget, when a thread frees up. */
  get retryAfterSeconds(): number {
    return Math.max(1, Math.ceil(this.options.budgetMs / 1000));
  }

  /** Starts the kept threads now, so the first request does not wait for them. */
  warm(): void {
    if (!this.#closed) this.#pool();
  }

  /**
   * Runs `task` in a thread. The budget starts when a thread picks the task up (the worker's
   * "started" message); until then the task may wait two budgets, never less than
   * `minQueueWaitMs`. Fails with the owner's errors: busy (queue full, waited too long, pool
   * closed), over budget, out of memory; the worker's own errors pass through unchanged.
   */
  async run(task: Omit<Task, 'startedPort'>, options: { budgetMs?: number } = {}): Promise<Result> {
    const { threads, maxQueue, minQueueWaitMs, heapMb } = this.options;
    if (this.#closed || this.#inFlight >= threads + maxQueue)
      throw this.#errors.busy(this.retryAfterSeconds);
    const budgetMs = options.budgetMs ?? this.options.budgetMs;
    const controller = new AbortController();
    const { port1, port2 } = new MessageChannel();
    let started = false;
    let timer = setTimeout(() => controller.abort(), Math.max(2 * budgetMs, minQueueWaitMs));
    port1.once('message', () => {
      started = true;
      clearTimeout(timer);
      timer = setTimeout(() => controller.abort(), budgetMs);
    });
    this.#inFlight += 1;
    try {
      // The task's own fields plus the port: the one shape the worker module expects.
      const withPort = { ...task, startedPort: port2 } as Task;
      return await this.#pool().run(withPort, {
        signal: controller.signal,
        transferList: [port2],
      });
    } catch (error) {
      if (this.#closed || (isAbort(error) && !started))
        throw this.#errors.busy(this.retryAfterSeconds);
      if (isAbort(error)) throw this.#errors.overBudget(budgetMs);
      if (isOutOfMemory(error)) throw this.#errors.outOfMemory(heapMb);
      throw error;
    } finally {
      this.#inFlight -= 1;
      clearTimeout(timer);
      port1.close();
    }
  }

  /** Stops the threads; running and queued tasks are refused as busy. */
  async close(): Promise<void> {
    this.#closed = true;
    const piscina = this.#piscina;
    this.#piscina = null;
    if (piscina) await piscina.destroy();
  }
}
