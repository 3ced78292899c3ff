// The run-time half of tenant scoping (the lint rule `seamwright/tenant-scope` is the other):
// every find, count, bulk update and bulk destroy on a tenant model must filter on company_id,
// or say why not with `unscopedReason`. A statement that does neither throws before it reaches
// the database, so a forgotten scope fails loudly in tests instead of leaking rows.
import type { Model, ModelStatic } from 'sequelize';

declare module 'sequelize' {
  // Type parameters must match sequelize's own declarations for the merge to apply.
  /* eslint-disable @typescript-eslint/no-explicit-any, @typescript-eslint/no-unused-vars --
     sequelize declares these interfaces with `TAttributes = any`; the merge must repeat it. */
  interface FindOptions<TAttributes = any> {
    /** Why this lookup on a tenant model may skip `company_id` (see tenant-guard.ts). */
    unscopedReason?: string;
  }
  interface CountOptions<TAttributes = any> {
    unscopedReason?: string;
  }
  interface UpdateOptions<TAttributes = any> {
    unscopedReason?: string;
  }
  interface DestroyOptions<TAttributes = any> {
    unscopedReason?: string;
  }
  /* eslint-enable @typescript-eslint/no-explicit-any, @typescript-eslint/no-unused-vars */
}

export class TenantScopeError extends Error {
  constructor(model: string, statement: string) {
    super(
      `${model}: ${statement} without company_id. Query through scoped(ctx, ${model}), or pass ` +
        '`unscopedReason` from an unsafe… function.',
    );
    this.name = 'TenantScopeError';
  }
}

export interface GuardedOptions {
  where?: unknown;
  unscopedReason?: string;
}

/** True when the top level of `where` pins company_id (attribute or, after mapping, column). */
function pinsCompany(where: unknown): boolean {
  if (typeof where !== 'object' || where === null) return false;
  const record = where as Record<string, unknown>;
  return record.companyId !== undefined || record.company_id !== undefined;
}

/** Throws unless `options` pins company_id or gives an `unscopedReason`. */
export function assertTenantScoped(model: string, statement: string, options: GuardedOptions) {
  if (options.unscopedReason || pinsCompany(options.where)) return;
  throw new TenantScopeError(model, statement);
}

const guardedHooks = {
  beforeFind: 'find',
  beforeCount: 'count',
  beforeBulkUpdate: 'update',
  beforeBulkDestroy: 'destroy',
} as const;

/**
 * Adds the guard hooks to each tenant model. Call after `init`, which resets a model's hooks, so
 * calling initModels again does not stack them.
 */
export function guardTenantModels(models: readonly ModelStatic<Model>[]): void {
  for (const model of models) {
    for (const [hook, statement] of Object.entries(guardedHooks)) {
      model.addHook(hook as keyof typeof guardedHooks, 'tenantGuard', (options: GuardedOptions) =>
        assertTenantScoped(model.name, statement, options),
      );
    }
  }
}
