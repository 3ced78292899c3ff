// @seamwright/domain: pure business rules (no I/O, no clock, no environment).
export * from './job-lifecycle.js';
export * from './calendar/index.js';
export * from './cancellation/index.js';
export * from './locate/index.js';
export * from './estimates/index.js';
export * from './invoices/index.js';
export * from './receivables/index.js';
export * from './scheduling/index.js';
