// The zod schemas each route parses its input with, keyed `method /api/path` as the RouteTable
// lists it. RouteTable.add attaches the line to the route's entry (`RouteEntry.inputs`), and
// tests/api/guard/schema-fuzz.test.ts fuzzes every write route from it: it fails for a
// POST/PATCH/PUT/DELETE route without a line, and for a line whose schema is not the one the
// handler really uses (the 400's field list must match this schema's issues).
//
// A line: `{ body: schema }` for a JSON body, `{ query: schema }` for a query string (GET lists),
// `{ plannerBody: true }` when the layout planner checks the body itself (422 naming the field),
// or `{}` for a write route that reads neither (DELETE, a bare POST action).
// Two bodies are no JSON a zod schema could describe: `{ multipart: true }` for a file upload
// (multipart/form-data, checked by the upload parser and the image check) and `{ rawBody: true }`
// for the processor's webhook (the signature covers the raw bytes). The fuzz does not mutate
// them field by field, but still sends them junk and requires a 4xx problem, never a 5xx, and no
// row written.
import type { z } from 'zod';
import {
  acceptEstimateInputSchema,
  acceptInvitationInputSchema,
  auditEventListQuerySchema,
  changePasswordInputSchema,
  createAreaInputSchema,
  createCreditNoteInputSchema,
  createCustomerInputSchema,
  createEstimateInputSchema,
  createInvitationInputSchema,
  createInvoiceInputSchema,
  createJobInputSchema,
  createLocateTicketInputSchema,
  createReservationInputSchema,
  createRollInputSchema,
  createSiteInputSchema,
  customerListQuerySchema,
  declineEstimateInputSchema,
  invoiceListQuerySchema,
  jobListQuerySchema,
  loginInputSchema,
  pageQuerySchema,
  passwordResetCompleteSchema,
  passwordResetRequestSchema,
  priceBookImportInputSchema,
  priceBookItemInputSchema,
  priceBookListQuerySchema,
  receiveDeliveryInputSchema,
  recordAcceptanceInputSchema,
  recordPaymentInputSchema,
  refundInputSchema,
  reminderSettingsInputSchema,
  returnRemnantsInputSchema,
  rollListQuerySchema,
  sendEstimateInputSchema,
  sendInvoiceInputSchema,
  sendReminderInputSchema,
  signupInputSchema,
  switchCompanyInputSchema,
  underlayScaleInputSchema,
  updateAreaInputSchema,
  updateCompanyInputSchema,
  updateCustomerInputSchema,
  updateEstimateInputSchema,
  updateEstimatingSettingsInputSchema,
  updateJobInputSchema,
  updateLocateTicketInputSchema,
  updateMemberInputSchema,
  updatePriceBookItemInputSchema,
  updateProfileInputSchema,
  updateRollInputSchema,
  updateSiteInputSchema,
  voidInvoiceInputSchema,
} from '@seamwright/shared';

export interface RouteInputs {
  /** The schema `req.body` is parsed with (`parseInput(schema, req.body)`). */
  body?: z.ZodType;
  /** The schema `req.query` is parsed with. */
  query?: z.ZodType;
  /** The body is the layout planner's request, checked by the planner (422 naming the field). */
  plannerBody?: true;
  /** A file upload (multipart/form-data): no JSON schema; the upload parser checks it. */
  multipart?: true;
  /** The raw bytes are the input (the processor's signed webhook). */
  rawBody?: true;
}

export const routeInputs: Record<string, RouteInputs> = {
  'post /api/auth/signup': { body: signupInputSchema },
  'post /api/auth/login': { body: loginInputSchema },
  'post /api/auth/logout': {},
  'post /api/auth/password-reset': { body: passwordResetRequestSchema },
  'post /api/auth/password-reset/:token': { body: passwordResetCompleteSchema },
  'post /api/invitations/:token/accept': { body: acceptInvitationInputSchema },
  'patch /api/me': { body: updateProfileInputSchema },
  'post /api/me/password': { body: changePasswordInputSchema },
  'post /api/me/company': { body: switchCompanyInputSchema },
  'patch /api/company': { body: updateCompanyInputSchema },
  'get /api/members': { query: pageQuerySchema },
  'patch /api/members/:id': { body: updateMemberInputSchema },
  'delete /api/members/:id': {},
  'post /api/invitations': { body: createInvitationInputSchema },
  'delete /api/invitations/:id': {},
  'get /api/customers': { query: customerListQuerySchema },
  'post /api/customers': { body: createCustomerInputSchema },
  'patch /api/customers/:id': { body: updateCustomerInputSchema },
  'delete /api/customers/:id': {},
  'get /api/customers/:id/sites': { query: pageQuerySchema },
  'post /api/customers/:id/sites': { body: createSiteInputSchema },
  'patch /api/sites/:id': { body: updateSiteInputSchema },
  'delete /api/sites/:id': {},
  'get /api/jobs': { query: jobListQuerySchema },
  'post /api/jobs': { body: createJobInputSchema },
  'patch /api/jobs/:id': { body: updateJobInputSchema },
  'post /api/jobs/:id/areas': { body: createAreaInputSchema },
  'patch /api/areas/:id': { body: updateAreaInputSchema },
  'delete /api/areas/:id': {},
  'post /api/jobs/:id/estimates': { body: createEstimateInputSchema },
  'patch /api/estimates/:id': { body: updateEstimateInputSchema },
  'post /api/estimates/:id/revisions': {},
  'post /api/estimates/:id/send': { body: sendEstimateInputSchema },
  'post /api/estimates/:id/links/revoke': {},
  'post /api/estimates/:id/acceptances': { body: recordAcceptanceInputSchema },
  'post /api/public/estimates/:token/accept': { body: acceptEstimateInputSchema },
  'post /api/public/estimates/:token/decline': { body: declineEstimateInputSchema },
  'get /api/rolls': { query: rollListQuerySchema },
  'post /api/rolls': { body: createRollInputSchema },
  'post /api/rolls/deliveries': { body: receiveDeliveryInputSchema },
  'patch /api/rolls/:id': { body: updateRollInputSchema },
  'post /api/jobs/:id/reservations': { body: createReservationInputSchema },
  'delete /api/jobs/:id/reservations': {},
  'post /api/jobs/:id/remnants': { body: returnRemnantsInputSchema },
  'post /api/jobs/:id/locate-tickets': { body: createLocateTicketInputSchema },
  'patch /api/locate-tickets/:id': { body: updateLocateTicketInputSchema },
  'post /api/plans/preview': { plannerBody: true },
  'post /api/plans/job-preview': { plannerBody: true },
  'get /api/audit-events': { query: auditEventListQuerySchema },
  'get /api/price-book': { query: priceBookListQuerySchema },
  'post /api/price-book': { body: priceBookItemInputSchema },
  'post /api/price-book/import': { body: priceBookImportInputSchema },
  'patch /api/price-book/:id': { body: updatePriceBookItemInputSchema },
  'delete /api/price-book/:id': {},
  'patch /api/estimating-settings': { body: updateEstimatingSettingsInputSchema },
  'post /api/webhooks/processor': { rawBody: true },
  'post /api/areas/:id/underlay': { multipart: true },
  'put /api/areas/:id/underlay/scale': { body: underlayScaleInputSchema },
  'delete /api/areas/:id/underlay': {},
  'get /api/invoices': { query: invoiceListQuerySchema },
  'post /api/invoices': { body: createInvoiceInputSchema },
  'post /api/invoices/:id/send': { body: sendInvoiceInputSchema },
  'post /api/invoices/:id/payments': { body: recordPaymentInputSchema },
  'post /api/invoices/:id/void': { body: voidInvoiceInputSchema },
  'post /api/invoices/:id/credit-notes': { body: createCreditNoteInputSchema },
  'post /api/invoices/:id/payments/:paymentId/refunds': { body: refundInputSchema },
  'post /api/public/invoices/:token/checkout': {},
  'put /api/settings/reminders': { body: reminderSettingsInputSchema },
  'post /api/invoices/:id/reminders': { body: sendReminderInputSchema },
};
