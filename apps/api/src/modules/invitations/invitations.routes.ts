import type { ServiceDeps } from '../../deps.js';
import type { RouteTable } from '../../http/route-table.js';
import {
  byActiveCompany,
  bySignedInUser,
  byTokenParam,
  createFlowLimits,
  createRateLimit,
} from '../auth/rate-limits.js';
import { createInvitationsHandlers } from './invitations.handlers.js';
import { createInvitationsService } from './invitations.service.js';

const dayMs = 24 * 60 * 60 * 1000;

export function registerInvitationsRoutes(routes: RouteTable, deps: ServiceDeps): void {
  const { env, sequelize } = deps;
  const { windowMs } = env.rateLimits;
  const handlers = createInvitationsHandlers(createInvitationsService(deps));
  const sendLimits = [
    ...createFlowLimits(sequelize, {
      name: 'invitation-send',
      limits: env.rateLimits.invitationSend,
      windowMs,
      account: bySignedInUser,
      message: 'Too many invitations at once; wait a while and try again',
    }),
    // Every invitation that is created sends one e-mail; refused ones (409, 400) do not count.
    createRateLimit(sequelize, {
      name: 'invitation-mails:company',
      limit: env.rateLimits.invitationMailsPerCompanyPerDay,
      windowMs: dayMs,
      key: byActiveCompany,
      message: 'This company has sent as many invitations as it may today; try again tomorrow',
      count: 'successes',
    }),
  ];
  // Accepting checks an existing account's password, so it is limited like signing in.
  const acceptLimits = createFlowLimits(sequelize, {
    name: 'invitation-accept',
    limits: env.rateLimits.invitationAccept,
    windowMs,
    account: byTokenParam,
    message: 'Too many attempts with this invitation; wait a while and try again',
  });
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
    ...sendLimits,
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
  routes.add(
    'post',
    '/invitations/:token/accept',
    { access: 'public' },
    ...acceptLimits,
    handlers.accept,
  );
}
