/**
 * @seamwright/api — entry for scripts and tests.
 *
 * - `createApp({ env, sequelize, plannerPool, mailer?, logger?, sessionStore? })` → Express app
 * - `new PlannerPool(env.planner)` → the layout planner's worker threads (close() when done)
 * - `loadEnv(source?)` → validated `Env`
 * - `createSequelize(env.db)` → Sequelize with every model registered
 * - `migrateDatabase(sequelize)` → applies pending migrations
 * - `seedDemoData(sequelize, env, plannerPool)` → loads the demo company once, areas planned
 * - `startServer(options?)` → listens on env.port with graceful shutdown
 * - `createLogger(level, destination?)` → the pino logger with the API's redaction rules
 * - `getJobTakeoff(ctx, jobId)`, `listJobTurfPieces(ctx, jobId)` → a job's takeoff and saved
 *   plan pieces (modules/areas/job-takeoff.service.ts), for tests and scripts
 * - `renderEstimatePdf(input, pool?)` → the estimate document's PDF, rendered in a worker
 *   thread (modules/estimate-document); `sampleEstimateDocumentInput()` is invented demo input
 * - `findInvoiceByToken(token)`, `recordProcessorPayment(input, tx)` → the invoice a pay link
 *   names, and a card payment recorded once per payment intent (modules/invoices)
 * - `inTransaction(sequelize, work)` → one transaction, retried on a deadlock
 */
export { createApp } from './app.js';
export type { AppDeps } from './app.js';
export { loadEnv } from './config/env.js';
export { PlannerPool } from './planner/planner-pool.js';
export type { PlannerPoolConfig } from './planner/planner-pool.js';
export type { Env } from './config/env.js';
export { createSequelize, inTransaction } from './db/sequelize.js';
export { migrateDatabase } from './db/migrate.js';
export { seedDemoData, demoPassword, demoUsers } from './seed/demo-data.js';
export { demoAreas } from './seed/demo-areas.js';
export { demoReservedJobTitles } from './seed/demo-stock.js';
export type { SeedResult } from './seed/demo-data.js';
export { startServer } from './server.js';
export { createMailer } from './mail/mailer.js';
export { createReminderWorker } from './modules/reminders/reminder-worker.js';
export type { ReminderWorker, PassResult } from './modules/reminders/reminder-worker.js';
export type { RunningServer, StartServerOptions } from './server.js';
export type { RouteEntry } from './http/route-table.js';
export { csrfHeaderName } from './http/csrf.js';
export { createLogger } from './http/logging.js';
export { answerMalformedRequests } from './http/malformed-requests.js';
export { createSessionStore } from './http/session.js';
export { executeSql, selectRows } from './db/sql.js';
export { unsafeInsertSearchWords } from './modules/customers/customer-search-words.js';
export { getJobTakeoff, listJobTurfPieces } from './modules/areas/job-takeoff.service.js';
export type { JobTurfPiece, JobTurfPieces } from './modules/areas/job-takeoff.service.js';
export { decoyPasswordFor, hashPassword } from './passwords.js';
export {
  DocumentPool,
  closeDefaultDocumentPool,
  defaultDocumentPoolConfig,
  documentCancellationNotice,
  renderEstimatePdf,
} from './modules/estimate-document/index.js';
export type * from './modules/estimate-document/estimate-document.types.js';
export type { DocumentPoolConfig } from './modules/estimate-document/index.js';
export { sampleEstimateDocumentInput } from './modules/estimate-document/sample-input.js';
export { markEstimateSent } from './modules/estimates/estimate-sending.service.js';
export { getEstimateForDocument } from './modules/estimates/estimate-document.service.js';
export type { EstimateDocument } from './modules/estimates/estimate-document.service.js';
export {
  createCheckoutSession,
  refundPayment,
  processorClient,
  processorProblem,
  ProcessorRefusedError,
  ProcessorUnavailableError,
  registerProcessorEventHandler,
  verifyProcessorEvent,
} from './modules/processor/index.js';
export type {
  CheckoutSessionInput,
  CheckoutSessionRef,
  ProcessorEventHandler,
  RefundInput,
  RefundRef,
} from './modules/processor/index.js';
export type { ProcessorConfig } from './config/env.js';
export {
  findInvoiceByToken,
  recordProcessorPayment,
  renderInvoicePdfFor,
} from './modules/invoices/index.js';
export type { InvoiceByToken, ProcessorPaymentInput } from './modules/invoices/index.js';
export { agingReport } from './modules/receivables/aging.service.js';
export { getDashboard } from './modules/dashboard/dashboard.service.js';
export { dashboardRange } from './modules/dashboard/dashboard-range.js';
export { collectedByMonth, invoicedByMonth } from './modules/dashboard/dashboard-money.queries.js';
export {
  installedFigures,
  pipelineByStatus,
  winRate,
} from './modules/dashboard/dashboard-jobs.queries.js';
