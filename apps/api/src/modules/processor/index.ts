// The payment processor, for the other modules: the SDK client, payments, errors, and the
// registry of webhook event handlers.
export { processorClient } from './processor-client.js';
export { createCheckoutSession, refundPayment } from './payments.service.js';
export type {
  CheckoutSessionInput,
  CheckoutSessionRef,
  RefundInput,
  RefundRef,
} from './payments.service.js';
export {
  callProcessor,
  processorProblem,
  ProcessorRefusedError,
  ProcessorUnavailableError,
} from './processor-errors.js';
export { registerProcessorEventHandler } from './processor-events.registry.js';
export type { ProcessorEventHandler, ProcessorEventType } from './processor-events.registry.js';
export { verifyProcessorEvent } from './webhook-verification.js';
