import { describe, expect, it } from 'vitest';
import {
  isFiltered,
  parseStockListParams,
  stockSearchFor,
  toStockSearchParams,
} from './list-params';

const parse = (query: string) => parseStockListParams(new URLSearchParams(query));
const productId = '3f0c6a52-2a5e-4c36-9d7e-0a4b4b1f9a11';

describe('stock list params', () => {
  it('gives defaults for an empty URL', () => {
    expect(parse('')).toEqual({
      page: 1,
      pageSize: 25,
      product: '',
      kind: 'all',
      dyeLot: '',
      all: false,
    });
  });

  it('falls back on anything unreadable', () => {
    expect(parse('page=0&pageSize=7&product=not-an-id&kind=pallet&all=yes')).toEqual(parse(''));
  });

  it('round-trips through the URL, leaving defaults out', () => {
    const params = parse(`product=${productId}&kind=remnant&dyeLot=L-4471&all=1&page=2`);
    expect(params).toMatchObject({ product: productId, kind: 'remnant', dyeLot: 'L-4471' });
    const search = toStockSearchParams(params);
    expect(search.toString()).toBe(`product=${productId}&kind=remnant&dyeLot=L-4471&all=1&page=2`);
    expect(parseStockListParams(search)).toEqual(params);
    expect(toStockSearchParams(parse('')).toString()).toBe('');
  });

  it('points at one product and lot after a delivery', () => {
    expect(stockSearchFor(productId, 'L 9')).toBe(`?product=${productId}&dyeLot=L+9`);
  });

  it('tells when the list is narrowed', () => {
    expect(isFiltered(parse('page=3&pageSize=50'))).toBe(false);
    expect(isFiltered(parse('kind=roll'))).toBe(true);
    expect(isFiltered(parse('all=1'))).toBe(true);
  });
});
