import { QueryTypes } from 'sequelize';
import type { CustomerListQuery } from '@seamwright/shared';
import type { RequestContext } from '../../context.js';
import { CustomerModel, SiteModel } from '../../db/models/index.js';
import type { Tx } from '../../db/sequelize.js';
import { scoped, scopedSql } from '../../db/tenant-scope.js';

export type CustomerRow = Awaited<
  ReturnType<ReturnType<typeof scoped<CustomerModel>>['findAll']>
>[number];

/** `%` and `_` typed by the user are literal characters, not wildcards. */
function containsPattern(text: string): string {
  return `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

const sortColumns = { name: 'name', createdAt: 'created_at', updatedAt: 'updated_at' } as const;

/** The WHERE conditions of a list query (after the company), in SQL over `customers`. */
function listFilter(query: CustomerListQuery): {
  sql: string;
  replacements: Record<string, unknown>;
} {
  const conditions: string[] = [];
  if (query.status === 'active') conditions.push('archived_at IS NULL');
  if (query.status === 'archived') conditions.push('archived_at IS NOT NULL');
  if (query.q)
    conditions.push('(name LIKE :pattern OR email LIKE :pattern OR phone LIKE :pattern)');
  const sql = conditions.map((c) => ` AND ${c}`).join('');
  return { sql, replacements: query.q ? { pattern: containsPattern(query.q) } : {} };
}

/** The list's total: the kept count when unfiltered by text, else a count through the index. */
function totalSql(query: CustomerListQuery, filter: string): string {
  if (query.q) return `SELECT COUNT(*) FROM customers WHERE company_id = :companyId${filter}`;
  const column = { active: 'active', archived: 'archived', all: 'active + archived' }[query.status];
  return `SELECT ${column} FROM customer_counts WHERE company_id = :companyId`;
}

const viewColumns = `c.id, c.name, c.email, c.phone, c.billing_address AS billingAddress, c.notes,
  c.archived_at AS archivedAt, c.created_at AS createdAt, c.updated_at AS updatedAt,
  (SELECT COUNT(*) FROM sites s WHERE s.company_id = :companyId AND s.customer_id = c.id) AS siteCount`;

export type CustomerListRow = Omit<CustomerRow, 'companyId'> & { siteCount: number };
type ListRow = Omit<CustomerListRow, 'id'> & { id: string | null; total: number | null };

function toListRow({ total: _total, ...row }: ListRow & { id: string }): CustomerListRow {
  return { ...row, siteCount: Number(row.siteCount) };
}

/**
 * One page of customers with their site counts and the list's total, in one statement: the
 * page's ids come from an index alone (so a late page skips index entries, not rows), then
 * only those rows are read. The total sits in a one-row table the page is left-joined to, so
 * it comes back even when the page is empty. See docs/PERFORMANCE.md for the plan.
 */
export async function listCustomers(ctx: RequestContext, query: CustomerListQuery) {
  const filter = listFilter(query);
  const direction = query.sort.direction === 'desc' ? 'DESC' : 'ASC';
  const column = sortColumns[query.sort.field];
  // The id breaks ties in the same direction, so the index serves the order in both directions.
  const order = (table: string) => `${table}${column} ${direction}, ${table}id ${direction}`;
  const rows = await scopedSql(ctx, CustomerModel.sequelize!).select<ListRow>(
    `SELECT t.total, ${viewColumns}
     FROM (SELECT (${totalSql(query, filter.sql)}) AS total) t
     LEFT JOIN (SELECT id FROM customers WHERE company_id = :companyId${filter.sql}
                ORDER BY ${order('')} LIMIT :limit OFFSET :offset) page ON TRUE
     LEFT JOIN customers c ON c.id = page.id AND c.company_id = :companyId
     ORDER BY ${order('c.')}`,
    { ...filter.replacements, limit: query.pageSize, offset: (query.page - 1) * query.pageSize },
  );
  const onPage = rows.filter((row): row is ListRow & { id: string } => row.id !== null);
  return { rows: onPage.map(toListRow), total: Number(rows[0]?.total ?? 0) };
}

/** One customer of this company with its site count, or null. */
export async function findCustomerView(
  ctx: RequestContext,
  id: string,
): Promise<CustomerListRow | null> {
  const [row] = await scopedSql(ctx, CustomerModel.sequelize!).select<ListRow & { id: string }>(
    `SELECT ${viewColumns}, NULL AS total FROM customers c
     WHERE c.id = :id AND c.company_id = :companyId`,
    { id },
  );
  return row ? toListRow(row) : null;
}

/**
 * Keeps `customer_counts` in step with a change to this company's customers, inside the
 * change's transaction. `active`/`archived` are the differences (+1 on create, −1 on delete).
 */
export function adjustCustomerCounts(
  ctx: RequestContext,
  change: { active: number; archived: number },
  tx: Tx,
): Promise<void> {
  return scopedSql(ctx, CustomerModel.sequelize!).execute(
    `INSERT INTO customer_counts (company_id, active, archived)
     VALUES (:companyId, GREATEST(:active, 0), GREATEST(:archived, 0))
     ON DUPLICATE KEY UPDATE active = GREATEST(active + :active, 0),
       archived = GREATEST(archived + :archived, 0)`,
    change,
    tx,
  );
}

export function findCustomer(ctx: RequestContext, id: string, tx?: Tx) {
  return scoped(ctx, CustomerModel).findById(id, tx ? { tx, lock: true } : {});
}

export function createCustomer(
  ctx: RequestContext,
  values: {
    name: string;
    email: string | null;
    phone: string | null;
    billingAddress: string | null;
    notes: string | null;
  },
  tx: Tx,
) {
  return scoped(ctx, CustomerModel).create({ ...values, archivedAt: null }, tx);
}

export function updateCustomer(
  ctx: RequestContext,
  id: string,
  values: Partial<Omit<CustomerRow, 'id' | 'companyId'>>,
  tx: Tx,
) {
  return scoped(ctx, CustomerModel).update(id, values, tx);
}

/** Removes the customer and every site of theirs in this company. */
export async function deleteCustomerWithSites(
  ctx: RequestContext,
  id: string,
  tx: Tx,
): Promise<void> {
  await scoped(ctx, SiteModel).destroy({ customerId: id }, tx);
  await scoped(ctx, CustomerModel).destroy({ id }, tx);
}

/**
 * Recounts one company's customer totals from its rows. Unscoped by design: for loaders that
 * insert customers without the service (the demo seed), which have no request context.
 */
export async function unsafeRecountCustomers(companyId: string, tx?: Tx): Promise<void> {
  await CustomerModel.sequelize!.query(
    `INSERT INTO customer_counts (company_id, active, archived)
     SELECT ?, COALESCE(SUM(archived_at IS NULL), 0), COALESCE(SUM(archived_at IS NOT NULL), 0)
     FROM customers WHERE company_id = ?
     ON DUPLICATE KEY UPDATE active = VALUES(active), archived = VALUES(archived)`,
    {
      replacements: [companyId, companyId],
      type: QueryTypes.INSERT,
      ...(tx ? { transaction: tx } : {}),
    },
  );
}
