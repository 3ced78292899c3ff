import type { ServiceDeps } from '../../deps.js';
import type { RouteTable } from '../../http/route-table.js';
import { byTokenParam, createFlowLimits } from '../auth/rate-limits.js';
import { createInvoiceCheckoutHandler } from './invoice-checkout.handlers.js';
import { registerInvoiceProcessorEvents } from './invoice-processor-events.js';
import { createRefundHandler } from './invoice-refunds.handlers.js';
import { createInvoicesHandlers } from './invoices.handlers.js';
import { createInvoicesService } from './invoices.service.js';

export function registerInvoicesRoutes(routes: RouteTable, deps: ServiceDeps): void {
  const handlers = createInvoicesHandlers(createInvoicesService(deps));
  const read = { access: 'tenant', permission: 'invoices.read' } as const;
  const write = { access: 'tenant', permission: 'invoices.write' } as const;
  const pay = { access: 'tenant', permission: 'payments.write' } as const;
  routes.add('get', '/invoices', read, handlers.list);
  routes.add('post', '/invoices', write, handlers.create);
  routes.add('get', '/invoices/:id', read, handlers.get);
  routes.add('get', '/invoices/:id/pdf', read, handlers.pdf);
  routes.add('post', '/invoices/:id/send', write, handlers.send);
  routes.add('post', '/invoices/:id/payments', pay, handlers.recordPayment);
  routes.add('post', '/invoices/:id/void', write, handlers.void);
  routes.add('post', '/invoices/:id/credit-notes', write, handlers.creditNote);
  routes.add(
    'post',
    '/invoices/:id/payments/:paymentId/refunds',
    { access: 'tenant', permission: 'payments.refund' },
    createRefundHandler(deps),
  );
  // Public: the token in the e-mailed link is the credential; limited per IP and per token with
  // the estimate links' allowances (counted apart from them).
  const linkLimits = createFlowLimits(deps.sequelize, {
    name: 'invoice-link',
    limits: deps.env.rateLimits.estimateLink,
    windowMs: deps.env.rateLimits.windowMs,
    account: byTokenParam,
    message: 'Too many requests for this invoice; wait a while and try again',
  });
  routes.add(
    'get',
    '/public/invoices/:token',
    { access: 'public' },
    ...linkLimits,
    handlers.publicView,
  );
  routes.add(
    'post',
    '/public/invoices/:token/checkout',
    { access: 'public' },
    ...linkLimits,
    createInvoiceCheckoutHandler(deps),
  );
  registerInvoiceProcessorEvents();
}
