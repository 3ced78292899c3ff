import type { ServiceDeps } from '../../deps.js';
import type { RouteTable } from '../../http/route-table.js';
import { createInvitationsHandlers } from './invitations.handlers.js';
import { createInvitationsService } from './invitations.service.js';

export function registerInvitationsRoutes(routes: RouteTable, deps: ServiceDeps): void {
  const handlers = createInvitationsHandlers(createInvitationsService(deps));
  routes.add(
    'get',
    '/invitations',
    { access: 'tenant', permission: 'members.manage' },
    handlers.list,
  );
  routes.add(
    'post',
    '/invitations',
    { access: 'tenant', permission: 'members.manage' },
    handlers.create,
  );
  routes.add(
    'delete',
    '/invitations/:id',
    { access: 'tenant', permission: 'members.manage' },
    handlers.revoke,
  );
  // Public: the token in the e-mailed link is the credential.
  routes.add('get', '/invitations/:token', { access: 'public' }, handlers.preview);
  routes.add('post', '/invitations/:token/accept', { access: 'public' }, handlers.accept);
}
