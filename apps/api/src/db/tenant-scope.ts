// The one mechanism that scopes tenant tables: every read, write and delete made through
// `scoped(ctx, Model)` has `company_id = ctx.companyId` injected, so a repository cannot forget
// it. Tenant repositories use this and nothing else to reach their tables.
import type {
  Attributes,
  CreationAttributes,
  FindAttributeOptions,
  FindOptions,
  Includeable,
  Model,
  ModelStatic,
  Order,
  WhereOptions,
} from 'sequelize';
import { QueryTypes } from 'sequelize';
import type { Sequelize } from 'sequelize';
import type { RequestContext } from '../context.js';
import type { Tx } from './sequelize.js';

type TenantModel = Model & { companyId: string; id: string };

export interface ScopedFindOptions<M extends TenantModel> {
  where?: WhereOptions<Attributes<M>>;
  order?: Order;
  limit?: number;
  offset?: number;
  tx?: Tx;
  /** Take a row lock (SELECT … FOR UPDATE) inside `tx`. */
  lock?: boolean;
  /**
   * Parent rows to join, only through a `(company_id, …)` foreign key (jobs → customers, sites),
   * which already keeps the parent in the row's own company. The joined rows come back nested.
   */
  include?: Includeable[];
  /** Columns to read (default: all), e.g. to add a computed one. */
  attributes?: FindAttributeOptions;
}

export function scoped<M extends TenantModel>(ctx: RequestContext, model: ModelStatic<M>) {
  // Sequelize's generic where/values types do not narrow over a generic model, hence the casts
  // through unknown; the shapes are checked by the callers' concrete model types.
  const asWhere = (where: object) => where as unknown as WhereOptions<Attributes<M>>;
  const withCompany = (where: WhereOptions<Attributes<M>> = {}): WhereOptions<Attributes<M>> =>
    asWhere({ ...where, companyId: ctx.companyId });

  const findOptions = (options: ScopedFindOptions<M>): FindOptions<Attributes<M>> => ({
    where: withCompany(options.where),
    ...(options.order ? { order: options.order } : {}),
    ...(options.limit !== undefined ? { limit: options.limit } : {}),
    ...(options.offset !== undefined ? { offset: options.offset } : {}),
    ...(options.include ? { include: options.include } : {}),
    ...(options.attributes ? { attributes: options.attributes } : {}),
    ...(options.tx
      ? { transaction: options.tx, ...(options.lock ? { lock: options.tx.LOCK.UPDATE } : {}) }
      : {}),
  });

  return {
    async findById(
      id: string,
      options: Omit<ScopedFindOptions<M>, 'where'> = {},
    ): Promise<Attributes<M> | null> {
      const row = await model.findOne(findOptions({ ...options, where: asWhere({ id }) }));
      return row ? (row.get({ plain: true }) as Attributes<M>) : null;
    },
    async findAll(options: ScopedFindOptions<M> = {}): Promise<Attributes<M>[]> {
      const rows = await model.findAll(findOptions(options));
      return rows.map((row) => row.get({ plain: true }) as Attributes<M>);
    },
    count(
      where: WhereOptions<Attributes<M>> = {},
      tx?: Tx,
      include?: Includeable[],
    ): Promise<number> {
      return model.count({
        where: withCompany(where),
        ...(tx ? { transaction: tx } : {}),
        ...(include ? { include, distinct: true, col: 'id' } : {}),
      });
    },
    async create(values: Omit<CreationAttributes<M>, 'companyId'>, tx: Tx): Promise<Attributes<M>> {
      const row = await model.create(
        { ...values, companyId: ctx.companyId } as unknown as CreationAttributes<M>,
        { transaction: tx },
      );
      return row.get({ plain: true }) as Attributes<M>;
    },
    /** Updates the row with `id` in this company; returns false when there is none. */
    async update(
      id: string,
      values: Partial<Omit<Attributes<M>, 'companyId' | 'id'>>,
      tx: Tx,
    ): Promise<boolean> {
      const [count] = await model.update(values as unknown as Partial<Attributes<M>>, {
        where: withCompany(asWhere({ id })),
        transaction: tx,
      });
      return count > 0;
    },
    destroy(where: WhereOptions<Attributes<M>>, tx: Tx): Promise<number> {
      return model.destroy({ where: withCompany(where), transaction: tx });
    },
  };
}

/**
 * Hand-written SQL for a measured hot path (docs/PERFORMANCE.md), where one statement does what
 * several model calls would. `:companyId` is bound to the context's company and must restrict
 * every tenant table the SQL reads or writes; SQL without it is refused. Other values go in as
 * named replacements (`:name`), never into the text.
 */
export function scopedSql(ctx: RequestContext, sequelize: Sequelize) {
  const bind = (sql: string, replacements: Record<string, unknown>) => {
    if (!sql.includes(':companyId')) throw new Error('scoped SQL must filter on :companyId');
    return { ...replacements, companyId: ctx.companyId };
  };
  return {
    select<T extends object>(sql: string, replacements: Record<string, unknown> = {}, tx?: Tx) {
      return sequelize.query<T>(sql, {
        replacements: bind(sql, replacements),
        type: QueryTypes.SELECT,
        ...(tx ? { transaction: tx } : {}),
      });
    },
    async execute(sql: string, replacements: Record<string, unknown>, tx: Tx): Promise<void> {
      await sequelize.query(sql, {
        replacements: bind(sql, replacements),
        type: QueryTypes.UPDATE,
        transaction: tx,
      });
    },
  };
}
