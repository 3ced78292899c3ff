// What crosses the thread boundary between the DocumentPool and its worker: plain data only.
import type { MessagePort } from 'node:worker_threads';
import type { EstimateDocumentInput } from './estimate-document.types.js';

export interface DocumentTask {
  readonly input: EstimateDocumentInput;
  /** The worker posts one message here when it starts, so the budget counts run time only. */
  readonly startedPort: MessagePort;
}
