import { can, type Action } from '@seamwright/shared';
import { queryClient } from '../../lib/query-client';
import { meQueryOptions } from '../../features/session/api/get-me';

/** Whether the signed-in role may do `action`; loaders skip warming what the role cannot read. */
export async function sessionCan(action: Action): Promise<boolean> {
  const me = await queryClient.ensureQueryData(meQueryOptions());
  return can(me.role, action);
}
