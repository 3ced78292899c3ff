// The layout planner, off the event loop: a piscina pool of worker threads, created once per
// app (ServiceDeps.plannerPool) and closed on shutdown. Every server-side use of the planner
// goes through planLayout() here, so one slow request can never stall the API.
import { MessageChannel } from 'node:worker_threads';
import { Piscina } from 'piscina';
import { LayoutInputError, checkJobRequestSize, checkLayoutRequestSize } from '@seamwright/takeoff';
import type { JobPlan, LayoutPlan, ReservationPlan, ReservationRequest } from '@seamwright/takeoff';
import { AppError } from '../errors.js';
import type { PlanKind, PlanOutcome, PlanTask } from './planner-task.js';

export interface PlannerPoolConfig {
  /** Worker threads. */
  readonly threads: number;
  /** Longest a task may run (ms) before its thread is ended. */
  readonly budgetMs: number;
  /** Tasks that may wait for a free thread; one more is answered 503. */
  readonly maxQueue: number;
}

const workerFile = new URL('./planner-worker.ts', import.meta.url);
/**
 * Planner threads run at a lower OS priority (Linux nice +10, through piscina), so on a busy
 * machine the event loop that answers every other request is scheduled first.
 */
const workerNiceIncrement = 10;
/** Heap per worker: a runaway plan fails alone instead of taking the process down. */
const workerHeapMb = 512;
/**
 * Longest a task may wait for a thread: two budgets (the task ahead finishes or is stopped),
 * but never less than a fresh thread needs to start under tsx (about 2 s on a busy machine).
 */
function queueWaitMs(budgetMs: number): number {
  return Math.max(2 * budgetMs, 10_000);
}

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

export class PlannerPool {
  readonly config: PlannerPoolConfig;
  /** Started on first use, so an app that never plans (most API tests) starts no threads. */
  #piscina: Piscina<PlanTask, PlanOutcome> | null = null;
  #closed = false;
  /**
   * Tasks running or waiting. Counted here because piscina keeps tasks that carry an
   * AbortSignal in a side queue its own `maxQueue` does not limit.
   */
  #inFlight = 0;

  constructor(config: PlannerPoolConfig) {
    this.config = config;
  }

  #pool(): Piscina<PlanTask, PlanOutcome> {
    this.#piscina ??= new Piscina<PlanTask, PlanOutcome>({
      filename: workerFile.href,
      minThreads: 1,
      maxThreads: this.config.threads,
      idleTimeout: 60_000,
      execArgv: workerExecArgv(),
      resourceLimits: { maxOldGenerationSizeMb: workerHeapMb },
      niceIncrement: workerNiceIncrement,
    });
    return this.#piscina;
  }

  /** Plans running or waiting for a thread right now. */
  get tasksInFlight(): number {
    return this.#inFlight;
  }

  /** Starts the first thread now, so the first request does not wait for it (server start). */
  warm(): void {
    if (!this.#closed) this.#pool();
  }

  /** Seconds a refused client should wait: about one budget, when a thread frees up. */
  get retryAfterSeconds(): number {
    return Math.max(1, Math.ceil(this.config.budgetMs / 1000));
  }

  #busy(): AppError {
    return new AppError(
      'SERVICE_BUSY',
      'The layout planner is busy with other requests; try again in a few seconds',
      { headers: { 'Retry-After': String(this.retryAfterSeconds) } },
    );
  }

  #tooMuchWork(what: string): AppError {
    return new AppError(
      'UNPROCESSABLE',
      `Planning this layout ${what} and was stopped; use fewer points or holes, ` +
        'a wider roll, a longer piece or a coarser length step',
    );
  }

  /**
   * Validates and plans one layout request in a worker thread. Throws LayoutInputError
   * (bad input, with its field path), AppError UNPROCESSABLE when the plan runs past
   * `budgetMs` of run time, or AppError SERVICE_BUSY (503, Retry-After) when the queue is
   * full or the task waited too long for a thread.
   */
  async planLayout(body: unknown, options: { budgetMs?: number } = {}): Promise<LayoutPlan> {
    // Array lengths only: an oversize request never takes a thread or a queue place.
    checkLayoutRequestSize(body);
    // The worker answers each kind with that kind's plan.
    return (await this.#run('layout', body, options)) as LayoutPlan;
  }

  /**
   * Validates and plans a job (several areas together, plan-job's contract) in a worker
   * thread, with the same errors, budget and queue as {@link planLayout}.
   */
  async planJob(body: unknown, options: { budgetMs?: number } = {}): Promise<JobPlan> {
    checkJobRequestSize(body);
    return (await this.#run('job', body, options)) as JobPlan;
  }

  /**
   * Reserves a job's pieces on the rolls in stock (reserveTurf) in a worker thread. The caller
   * builds the request from its own rows and keeps it within MAX_RESERVATION_PIECES and
   * MAX_RESERVATION_ROLLS; the search's own work limit keeps it well inside the budget.
   */
  async reserveTurf(
    request: ReservationRequest,
    options: { budgetMs?: number } = {},
  ): Promise<ReservationPlan> {
    return (await this.#run('reserve', request, options)) as ReservationPlan;
  }

  async #run(
    kind: PlanKind,
    body: unknown,
    options: { budgetMs?: number },
  ): Promise<LayoutPlan | JobPlan | ReservationPlan> {
    if (this.#closed || this.#inFlight >= this.config.threads + this.config.maxQueue)
      throw this.#busy();
    const budgetMs = options.budgetMs ?? this.config.budgetMs;
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
      const outcome = await this.#pool().run(
        { kind, body, startedPort: port2 },
        { signal: controller.signal, transferList: [port2] },
      );
      if (!outcome.ok)
        throw new LayoutInputError(outcome.inputError.path, outcome.inputError.detail);
      return outcome.plan;
    } catch (error) {
      if (this.#closed || (isAbort(error) && !started)) throw this.#busy();
      if (isAbort(error))
        throw this.#tooMuchWork(`took longer than the ${budgetMs / 1000} s limit`);
      if (isOutOfMemory(error)) throw this.#tooMuchWork(`needed more than ${workerHeapMb} MB`);
      throw error;
    } finally {
      this.#inFlight -= 1;
      clearTimeout(timer);
      port1.close();
    }
  }

  /** Stops the threads; running and queued tasks are answered 503. */
  async close(): Promise<void> {
    this.#closed = true;
    const piscina = this.#piscina;
    this.#piscina = null;
    if (piscina) await piscina.destroy();
  }
}
