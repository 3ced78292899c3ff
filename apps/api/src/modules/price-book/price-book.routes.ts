import type { ServiceDeps } from '../../deps.js';
import type { RouteTable } from '../../http/route-table.js';
import { createPriceBookHandlers } from './price-book.handlers.js';
import { createPriceBookImportService } from './price-book-import.service.js';
import { createPriceBookService } from './price-book.service.js';

export function registerPriceBookRoutes(routes: RouteTable, deps: ServiceDeps): void {
  const handlers = createPriceBookHandlers(
    createPriceBookService(deps.sequelize),
    createPriceBookImportService(deps.sequelize),
  );
  const read = { access: 'tenant', permission: 'pricebook.read' } as const;
  const write = { access: 'tenant', permission: 'pricebook.write' } as const;
  routes.add('get', '/price-book', read, handlers.list);
  routes.add('post', '/price-book', write, handlers.create);
  routes.add('get', '/price-book/export.csv', read, handlers.exportCsv);
  routes.add('post', '/price-book/import', write, handlers.importCsv);
  routes.add('patch', '/price-book/:id', write, handlers.update);
  routes.add('delete', '/price-book/:id', write, handlers.remove);
}
