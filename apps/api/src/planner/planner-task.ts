// What crosses the thread boundary between the PlannerPool and its worker. Only plain data:
// class instances (LayoutInputError) do not survive structured cloning, so the worker sends
// the error's fields and the pool rebuilds it.
import type { MessagePort } from 'node:worker_threads';
import type { JobPlan, LayoutPlan, ReservationPlan } from '@seamwright/takeoff';

/**
 * `layout`: one area (plan-layout's contract); `job`: several areas together (plan-job's);
 * `reserve`: a job's pieces on the rolls in stock (reserveTurf, a request the API built).
 */
export type PlanKind = 'layout' | 'job' | 'reserve';

export interface PlanTask {
  readonly kind: PlanKind;
  /** The untrusted request body; the worker validates it. */
  readonly body: unknown;
  /** The worker posts one message here when it starts, so the budget counts run time only. */
  readonly startedPort: MessagePort;
}

export type PlanOutcome =
  | { readonly ok: true; readonly plan: LayoutPlan | JobPlan | ReservationPlan }
  | { readonly ok: false; readonly inputError: { readonly path: string; readonly detail: string } };
