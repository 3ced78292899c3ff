import type { ServiceDeps } from '../../deps.js';
import type { RouteTable } from '../../http/route-table.js';
import { byTokenParam, createFlowLimits } from '../auth/rate-limits.js';
import { createEstimateAnswersHandlers } from './estimate-answers.handlers.js';
import { createEstimateAnswersService } from './estimate-answers.service.js';
import { createEstimateSendService } from './estimate-send.service.js';
import { createEstimateSendingHandlers } from './estimate-sending.handlers.js';
import { createEstimatesHandlers } from './estimates.handlers.js';
import { createEstimatesService } from './estimates.service.js';

export function registerEstimatesRoutes(routes: RouteTable, deps: ServiceDeps): void {
  const handlers = createEstimatesHandlers(createEstimatesService(deps));
  const read = { access: 'tenant', permission: 'estimates.read' } as const;
  const write = { access: 'tenant', permission: 'estimates.write' } as const;
  routes.add('get', '/jobs/:id/estimates', read, handlers.listForJob);
  routes.add('post', '/jobs/:id/estimates', write, handlers.create);
  routes.add('get', '/estimates/:id', read, handlers.get);
  routes.add('patch', '/estimates/:id', write, handlers.update);
  routes.add('post', '/estimates/:id/revisions', write, handlers.revise);
  routes.add('get', '/estimates/:id/pdf', read, handlers.pdf);
  const sending = createEstimateSendingHandlers(createEstimateSendService(deps));
  const send = { access: 'tenant', permission: 'estimates.send' } as const;
  routes.add('post', '/estimates/:id/send', send, sending.send);
  routes.add('post', '/estimates/:id/links/revoke', send, sending.revokeLinks);
  const answers = createEstimateAnswersHandlers(createEstimateAnswersService(deps));
  routes.add('post', '/estimates/:id/acceptances', send, answers.recordInPerson);
  // Public: the token in the e-mailed link is the credential; limited per IP and per token
  // like the other one-time links, so guessing tokens gets nowhere.
  const linkLimits = createFlowLimits(deps.sequelize, {
    name: 'estimate-link',
    limits: deps.env.rateLimits.estimateLink,
    windowMs: deps.env.rateLimits.windowMs,
    account: byTokenParam,
    message: 'Too many requests for this estimate; wait a while and try again',
  });
  const open = { access: 'public' } as const;
  routes.add('get', '/public/estimates/:token', open, ...linkLimits, answers.view);
  routes.add('post', '/public/estimates/:token/accept', open, ...linkLimits, answers.accept);
  routes.add('post', '/public/estimates/:token/decline', open, ...linkLimits, answers.decline);
}
