// Runs inside a piscina worker thread: validates and plans one layout or job request. Everything
// slow (the ring checks, the direction search, the packing) happens here, off the API's
// event loop; the pool ends this thread when a task outlives its budget.
import {
  LayoutInputError,
  parseJobRequest,
  planJob,
  planLayout,
  reserveTurf,
} from '@seamwright/takeoff';
import type { LayoutRequestInput, ReservationRequest } from '@seamwright/takeoff';
import type { PlanOutcome, PlanTask } from './planner-task.js';

export default function planInWorker(task: PlanTask): PlanOutcome {
  task.startedPort.postMessage('started');
  task.startedPort.close();
  try {
    if (task.kind === 'job') return { ok: true, plan: planJob(parseJobRequest(task.body)) };
    // Built by the API from its own rows and size-checked there, so it is not parsed again.
    if (task.kind === 'reserve')
      return { ok: true, plan: reserveTurf(task.body as ReservationRequest) };
    // planLayout validates its input with parseLayoutRequest first (and only once).
    return { ok: true, plan: planLayout(task.body as LayoutRequestInput) };
  } catch (error) {
    if (error instanceof LayoutInputError)
      return { ok: false, inputError: { path: error.path, detail: error.detail } };
    throw error;
  }
}
