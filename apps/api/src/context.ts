import type { Role } from '@seamwright/shared';

/**
 * Who is acting and in which company. Built only from the session (never from the body, query
 * or headers) and re-checked against the membership table on every request.
 */
export interface RequestContext {
  readonly userId: string;
  readonly companyId: string;
  readonly role: Role;
}
