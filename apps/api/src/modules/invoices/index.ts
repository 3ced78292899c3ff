// What other modules (the processor's checkout and webhook routes) use of invoices.
export { findInvoiceByToken, toPublicInvoiceView } from './public-invoices.service.js';
export type { InvoiceByToken } from './public-invoices.service.js';
export { recordProcessorPayment } from './invoice-payments.service.js';
export type { ProcessorPaymentInput } from './invoice-payments.service.js';
export { invoiceReference } from './invoice-view.js';
export { renderInvoicePdfFor } from './invoices.service.js';
