import type { ServiceDeps } from '../../deps.js';
import type { RouteTable } from '../../http/route-table.js';
import { createRemindersHandlers } from './reminders.handlers.js';
import { createRemindersService } from './reminders.service.js';

export function registerRemindersRoutes(routes: RouteTable, deps: ServiceDeps): void {
  const handlers = createRemindersHandlers(createRemindersService(deps));
  const manage = { access: 'tenant', permission: 'reminders.manage' } as const;
  routes.add('get', '/settings/reminders', manage, handlers.getSettings);
  routes.add('put', '/settings/reminders', manage, handlers.putSettings);
  // The log follows the invoice's own read access (the office answers the customer's call).
  routes.add(
    'get',
    '/invoices/:id/reminders',
    { access: 'tenant', permission: 'invoices.read' },
    handlers.listLog,
  );
  routes.add('post', '/invoices/:id/reminders', manage, handlers.sendNow);
}
