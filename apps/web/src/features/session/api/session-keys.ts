import { sessionMeKey } from '../../../lib/query-client';

/** Query keys of the signed-in session. */
export const sessionKeys = {
  all: ['session'] as const,
  me: () => sessionMeKey,
  companies: () => ['session', 'companies'] as const,
};
