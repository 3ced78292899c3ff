import type { ServiceDeps } from '../../deps.js';
import type { RouteTable } from '../../http/route-table.js';
import { singleFileUpload } from '../uploads/upload-parser.js';
import { createAreaUnderlayHandlers } from './area-underlay.handlers.js';
import { createAreaUnderlayService, underlayField } from './area-underlay.service.js';
import { createAreasHandlers } from './areas.handlers.js';
import { createAreasService } from './areas.service.js';

export function registerAreasRoutes(routes: RouteTable, deps: ServiceDeps): void {
  const handlers = createAreasHandlers(createAreasService(deps));
  const read = { access: 'tenant', permission: 'areas.read' } as const;
  const write = { access: 'tenant', permission: 'areas.write' } as const;
  routes.add('get', '/jobs/:id/areas', read, handlers.listForJob);
  routes.add('post', '/jobs/:id/areas', write, handlers.create);
  routes.add('get', '/jobs/:id/takeoff', read, handlers.takeoff);
  routes.add('get', '/areas/:id', read, handlers.get);
  routes.add('patch', '/areas/:id', write, handlers.update);
  routes.add('delete', '/areas/:id', write, handlers.remove);

  const underlay = createAreaUnderlayHandlers(createAreaUnderlayService(deps));
  // The file is read (multer) only after sign-in and the permission check.
  routes.add(
    'post',
    '/areas/:id/underlay',
    { ...write, body: 'multipart' },
    singleFileUpload(underlayField),
    underlay.upload,
  );
  routes.add('put', '/areas/:id/underlay/scale', write, underlay.setScale);
  routes.add('get', '/areas/:id/underlay', read, underlay.get);
  routes.add('delete', '/areas/:id/underlay', write, underlay.remove);
}
