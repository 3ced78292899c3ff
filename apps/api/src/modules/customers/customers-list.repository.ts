// The customers list and a customer's view, as hand-written SQL on a measured hot path
// (docs/PERFORMANCE.md has the plans and timings of each shape).
import type { CustomerListQuery } from '@seamwright/shared';
import type { RequestContext } from '../../context.js';
import { CustomerModel } from '../../db/models/index.js';
import { scopedSql } from '../../db/tenant-scope.js';
import { prefixPattern, searchTerms } from './customer-search-words.js';
import type { CustomerRow } from './customers.repository.js';

const sortColumns = { name: 'name', createdAt: 'created_at', updatedAt: 'updated_at' } as const;

/**
 * Unsearched pages that start before this many rows are read straight off the sort's index,
 * full rows and all; deeper ones take their ids from the index alone first, so the rows skipped
 * are index entries, not rows (measured crossover in docs/PERFORMANCE.md). A search always
 * takes the ids first: its matches are sorted, and sorting ids is cheaper than sorting rows.
 */
export const directReadRows = 200;

/** The WHERE conditions of a list query (after the company), in SQL over `customers`. */
function listFilter(query: CustomerListQuery): {
  sql: string;
  replacements: Record<string, unknown>;
} {
  const conditions: string[] = [];
  const replacements: Record<string, unknown> = {};
  if (query.status === 'active') conditions.push('archived_at IS NULL');
  if (query.status === 'archived') conditions.push('archived_at IS NOT NULL');
  const terms = searchTerms(query.q ?? '');
  // One character: the name starts with it, a range of the name index in list order. As a word
  // prefix it would match most of the company and read all of it (measured in PERFORMANCE.md).
  if (terms.length === 1 && terms[0]!.length === 1) {
    conditions.push('name LIKE :namePrefix');
    replacements.namePrefix = prefixPattern(terms[0]!);
    return { sql: conditions.map((c) => ` AND ${c}`).join(''), replacements };
  }
  // Each term must begin one of the customer's words (customer-search-words.ts): a range of
  // the (company_id, word) key per term, never a scan of the company's customers.
  terms.forEach((term, i) => {
    conditions.push(
      `id IN (SELECT w.customer_id FROM customer_search_words w
              WHERE w.company_id = :companyId AND w.word LIKE :term${i})`,
    );
    replacements[`term${i}`] = prefixPattern(term);
  });
  return { sql: conditions.map((c) => ` AND ${c}`).join(''), replacements };
}

/** The list's total: the kept count when unfiltered by text, else a count of the matches. */
function totalSql(query: CustomerListQuery, filter: string): string {
  if (query.q?.trim())
    return `SELECT COUNT(*) FROM customers WHERE company_id = :companyId${filter}`;
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

function orderBy(query: CustomerListQuery) {
  const direction = query.sort.direction === 'desc' ? 'DESC' : 'ASC';
  const column = sortColumns[query.sort.field];
  // The id breaks ties in the same direction, so the index serves the order in both directions.
  return (table: string) => `${table}${column} ${direction}, ${table}id ${direction}`;
}

/**
 * One page of customers with their site counts and the list's total, in one statement.
 * A first page is a plain index-ordered read with the total as a sub-select; a page that comes
 * back empty past the first reads its total alone (one more statement, only then). A deep page
 * or a search takes its ids first and joins the total as a one-row table, so it answers the
 * total even when empty.
 */
export async function listCustomers(ctx: RequestContext, query: CustomerListQuery) {
  const filter = listFilter(query);
  const order = orderBy(query);
  const sql = scopedSql(ctx, CustomerModel.sequelize!);
  const offset = (query.page - 1) * query.pageSize;
  const replacements = { ...filter.replacements, limit: query.pageSize, offset };
  const total = totalSql(query, filter.sql);
  if (!query.q?.trim() && offset < directReadRows) {
    const rows = await sql.select<ListRow & { id: string }>(
      `SELECT ${viewColumns}, (${total}) AS total
       FROM customers c WHERE c.company_id = :companyId${filter.sql}
       ORDER BY ${order('c.')} LIMIT :limit OFFSET :offset`,
      replacements,
    );
    if (rows.length > 0 || offset === 0)
      return { rows: rows.map(toListRow), total: Number(rows[0]?.total ?? 0) };
    const [alone] = await sql.select<{ total: number }>(`SELECT (${total}) AS total`, replacements);
    return { rows: [], total: Number(alone?.total ?? 0) };
  }
  const rows = await sql.select<ListRow>(
    `SELECT t.total, ${viewColumns}
     FROM (SELECT (${total}) AS total) t
     LEFT JOIN (SELECT id FROM customers WHERE company_id = :companyId${filter.sql}
                ORDER BY ${order('')} LIMIT :limit OFFSET :offset) page ON TRUE
     LEFT JOIN customers c ON c.id = page.id AND c.company_id = :companyId
     ORDER BY ${order('c.')}`,
    replacements,
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
     WHERE c.company_id = :companyId AND c.id = :id`,
    { id },
  );
  return row ? toListRow(row) : null;
}
