// The layout planner, off the event loop: a piscina pool of worker threads, created once per
// app (ServiceDeps.plannerPool) and closed on shutdown. Every server-side use of the planner
// goes through planLayout() here, so one slow request can never stall the API.
import { LayoutInputError, checkJobRequestSize, checkLayoutRequestSize } from '@seamwright/takeoff';
import type { JobPlan, LayoutPlan, ReservationPlan, ReservationRequest } from '@seamwright/takeoff';
import { AppError } from '../errors.js';
import { BudgetedPool } from '../workers/budgeted-pool.js';
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
/** Heap per worker: a runaway plan fails alone instead of taking the process down. */
const workerHeapMb = 512;

function tooMuchWork(what: string): AppError {
  return new AppError(
    'UNPROCESSABLE',
    `Planning this layout ${what} and was stopped; use fewer points or holes, ` +
      'a wider roll, a longer piece or a coarser length step',
  );
}

export class PlannerPool {
  readonly config: PlannerPoolConfig;
  readonly #pool: BudgetedPool<PlanTask, PlanOutcome>;

  constructor(config: PlannerPoolConfig) {
    this.config = config;
    this.#pool = new BudgetedPool<PlanTask, PlanOutcome>(
      {
        workerFile,
        threads: config.threads,
        budgetMs: config.budgetMs,
        maxQueue: config.maxQueue,
        minThreads: 1,
        heapMb: workerHeapMb,
        // A fresh thread needs about 2 s to start under tsx on a busy machine.
        minQueueWaitMs: 10_000,
      },
      {
        busy: (seconds) =>
          new AppError(
            'SERVICE_BUSY',
            'The layout planner is busy with other requests; try again in a few seconds',
            { headers: { 'Retry-After': String(seconds) } },
          ),
        overBudget: (budgetMs) => tooMuchWork(`took longer than the ${budgetMs / 1000} s limit`),
        outOfMemory: (heapMb) => tooMuchWork(`needed more than ${heapMb} MB`),
      },
    );
  }

  /** Plans running or waiting for a thread right now. */
  get tasksInFlight(): number {
    return this.#pool.tasksInFlight;
  }

  /** Starts the first thread now, so the first request does not wait for it (server start). */
  warm(): void {
    this.#pool.warm();
  }

  /** Seconds a refused client should wait: about one budget, when a thread frees up. */
  get retryAfterSeconds(): number {
    return this.#pool.retryAfterSeconds;
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
    const outcome = await this.#pool.run({ kind, body }, options);
    if (!outcome.ok) throw new LayoutInputError(outcome.inputError.path, outcome.inputError.detail);
    return outcome.plan;
  }

  /** Stops the threads; running and queued tasks are answered 503. */
  async close(): Promise<void> {
    await this.#pool.close();
  }
}
