import { describe, expect, it } from 'vitest';
import { customerListQuerySchema } from '@seamwright/shared';
import {
  joinSort,
  parseCustomerListParams,
  splitSort,
  toCustomerSearchParams,
  type CustomerListParams,
} from './list-params';

describe('customer list URL params', () => {
  it('gives the defaults for an empty URL, and writes nothing back for them', () => {
    const params = parseCustomerListParams(new URLSearchParams());
    expect(params).toEqual({ page: 1, pageSize: 25, sort: 'name', q: '', status: 'active' });
    expect(toCustomerSearchParams(params).toString()).toBe('');
  });

  it.each<CustomerListParams>([
    { page: 3, pageSize: 50, sort: '-createdAt', q: 'meadow', status: 'archived' },
    { page: 1, pageSize: 10, sort: '-name', q: 'o’brien & sons', status: 'all' },
    { page: 12, pageSize: 100, sort: 'updatedAt', q: '', status: 'active' },
  ])('survives a round trip through the URL: %o', (params) => {
    const url = `/customers?${toCustomerSearchParams(params).toString()}`;
    expect(parseCustomerListParams(new URL(url, 'http://x').searchParams)).toEqual(params);
  });

  it('falls back field by field on hand-edited values instead of failing', () => {
    const params = parseCustomerListParams(
      new URLSearchParams('page=-4&pageSize=33&sort=password&status=deleted&q=%20lawn%20'),
    );
    expect(params).toEqual({ page: 1, pageSize: 25, sort: 'name', q: 'lawn', status: 'active' });
  });

  it('produces only what the API list schema accepts', () => {
    const params = parseCustomerListParams(
      new URLSearchParams('sort=-createdAt&pageSize=100&status=all&page=2'),
    );
    const parsed = customerListQuerySchema.parse({ ...params, q: params.q || undefined });
    expect(parsed.sort).toEqual({ field: 'createdAt', direction: 'desc' });
    expect(parsed.pageSize).toBe(100);
  });

  it('splits and joins the sort for table headers', () => {
    expect(splitSort('-createdAt')).toEqual({ field: 'createdAt', direction: 'desc' });
    expect(joinSort('name', 'desc')).toBe('-name');
    // A column the server cannot sort by falls back to the default order instead of breaking the URL.
    expect(joinSort('siteCount', 'asc')).toBe('name');
  });
});
