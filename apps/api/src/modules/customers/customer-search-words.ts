// The words a customer is found by (table `customer_search_words`, migration 0018), and the
// terms a search is split into. A search matches word prefixes through the table's
// (company_id, word) key, so it reads only the matching entries instead of testing a substring
// against every customer of the company (docs/PERFORMANCE.md, "Search").
//
// Decision (DEVELOPERS.md, "Customer search"): every term of the query must be the beginning of a
// word of the name or the e-mail, or of the phone's digits from one of its digit groups on.
// A "word" is each space-separated piece, and also each of its tails that starts a run of
// letters or digits, so "o'brien" is found by "brien" and "ash.wright@example.test" by
// "wright", "example" or "ash.wright@". Phone-like queries (only digits and phone punctuation)
// are compared as digits: "014-7777" and "0147" find "555-014-7777"; "4777" does not.
import { QueryTypes } from 'sequelize';
import type { Sequelize, Transaction } from 'sequelize';

/** Column width of `customer_search_words.word`; longer words are kept as their prefix. */
export const searchWordLength = 100;
/** Terms past these are ignored: each one costs an index lookup. */
const maxTerms = 5;

const runStart = /[\p{L}\p{N}]+/gu;
const phoneLike = /^[\d\s()+.\-/]+$/;

function tailsOf(piece: string, into: Set<string>): void {
  into.add(piece.slice(0, searchWordLength));
  for (const match of piece.matchAll(runStart)) {
    into.add(piece.slice(match.index).slice(0, searchWordLength));
  }
}

/** The phone's digits from each digit group on: "555-014-7777" → 5550147777, 0147777, 7777. */
function phoneWords(phone: string, into: Set<string>): void {
  const groups = phone.match(/\d+/g) ?? [];
  for (let i = 0; i < groups.length; i += 1) into.add(groups.slice(i).join(''));
}

export function customerSearchWords(customer: {
  name: string;
  email: string | null;
  phone: string | null;
}): string[] {
  const words = new Set<string>();
  for (const text of [customer.name, customer.email ?? '']) {
    for (const piece of text.toLowerCase().split(/\s+/)) if (piece) tailsOf(piece, words);
  }
  if (customer.phone) phoneWords(customer.phone, words);
  words.delete('');
  return [...words];
}

/** The prefixes a query looks up, each to be matched by some word of the customer. */
export function searchTerms(query: string): string[] {
  const text = query.trim().toLowerCase();
  if (phoneLike.test(text)) {
    const digits = text.replace(/\D/g, '');
    if (digits) return [digits.slice(0, searchWordLength)];
  }
  const terms = text.split(/\s+/).filter(Boolean);
  return [...new Set(terms)].slice(0, maxTerms).map((t) => t.slice(0, searchWordLength));
}

/** A `LIKE` pattern for "starts with": `%`, `_` and `\` typed by the user are literal. */
export function prefixPattern(term: string): string {
  return `${term.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

export interface SearchWordRow {
  id: string;
  companyId: string;
  name: string;
  email: string | null;
  phone: string | null;
}

/**
 * Writes the words of these customers, a thousand to a statement. For loaders without a
 * request context (migration 0018, the demo and bench seeds); the service writes through
 * `writeSearchWords`. The key compares words by the column's collation (case and accents
 * folded), so two words told apart here may be one key: the second is a no-op, not an error.
 */
export async function unsafeInsertSearchWords(
  sequelize: Sequelize,
  customers: SearchWordRow[],
  transaction?: Transaction,
): Promise<void> {
  const values = customers.flatMap((c) =>
    customerSearchWords(c).map((word) => [c.companyId, word, c.id]),
  );
  for (let start = 0; start < values.length; start += 1000) {
    const batch = values.slice(start, start + 1000);
    await sequelize.query(
      `INSERT INTO customer_search_words (company_id, word, customer_id)
       VALUES ${batch.map(() => '(?, ?, ?)').join(', ')}
       ON DUPLICATE KEY UPDATE customer_id = customer_id`,
      {
        replacements: batch.flat(),
        type: QueryTypes.INSERT,
        ...(transaction ? { transaction } : {}),
      },
    );
  }
}
