// Receivables: the aging report, customer statements (PDF, e-mailed on demand) and the
// accountant's CSV exports. Bookkeeper and owner only; crew leads and the office get 403.
import type { ServiceDeps } from '../../deps.js';
import type { RouteTable } from '../../http/route-table.js';
import { createReceivablesHandlers } from './receivables.handlers.js';

export function registerReceivablesRoutes(routes: RouteTable, deps: ServiceDeps): void {
  const handlers = createReceivablesHandlers(deps);
  const read = { access: 'tenant', permission: 'receivables.read' } as const;
  const send = { access: 'tenant', permission: 'statements.send' } as const;
  const exports = { access: 'tenant', permission: 'exports.read' } as const;
  routes.add('get', '/reports/aging', read, handlers.aging);
  routes.add('get', '/customers/:id/statement.pdf', read, handlers.statementPdf);
  routes.add('post', '/customers/:id/statement', send, handlers.sendStatement);
  routes.add('get', '/exports/invoices.csv', exports, handlers.invoicesCsv);
  routes.add('get', '/exports/payments.csv', exports, handlers.paymentsCsv);
}
