import { QueryTypes } from 'sequelize';
import type { RequestContext } from '../../context.js';
import { CustomerModel, SiteModel } from '../../db/models/index.js';
import type { Tx } from '../../db/sequelize.js';
import { scoped, scopedSql } from '../../db/tenant-scope.js';
import { customerSearchWords, unsafeInsertSearchWords } from './customer-search-words.js';
import type { SearchWordRow } from './customer-search-words.js';

export type CustomerRow = Awaited<
  ReturnType<ReturnType<typeof scoped<CustomerModel>>['findAll']>
>[number];

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

/**
 * Rewrites the words this customer is found by (customer-search-words.ts), inside the
 * change's transaction, so a search never sees a name or e-mail the row no longer has.
 */
export async function writeSearchWords(
  ctx: RequestContext,
  customer: { id: string; name: string; email: string | null; phone: string | null },
  tx: Tx,
  replace: boolean,
): Promise<void> {
  const sql = scopedSql(ctx, CustomerModel.sequelize!);
  if (replace)
    await sql.execute(
      'DELETE FROM customer_search_words WHERE company_id = :companyId AND customer_id = :id',
      { id: customer.id },
      tx,
    );
  const words = customerSearchWords(customer);
  if (words.length === 0) return;
  const values = words.map((_, i) => `(:companyId, :w${i}, :id)`).join(', ');
  // The key compares words by the column's collation (case and accents folded), so two words
  // told apart here may be one key: the second is a no-op, not an error.
  await sql.execute(
    `INSERT INTO customer_search_words (company_id, word, customer_id) VALUES ${values}
     ON DUPLICATE KEY UPDATE customer_id = customer_id`,
    { id: customer.id, ...Object.fromEntries(words.map((w, n) => [`w${n}`, w])) },
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

/**
 * Writes the search words of every customer of one company. Unscoped by design, like the
 * recount above: for loaders that insert customers without the service (the demo seed).
 */
export async function unsafeIndexCustomerSearch(companyId: string, tx?: Tx): Promise<void> {
  const rows = await CustomerModel.sequelize!.query<SearchWordRow>(
    'SELECT id, company_id AS companyId, name, email, phone FROM customers WHERE company_id = ?',
    { replacements: [companyId], type: QueryTypes.SELECT, ...(tx ? { transaction: tx } : {}) },
  );
  await unsafeInsertSearchWords(CustomerModel.sequelize!, rows, tx);
}
