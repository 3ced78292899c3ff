import { describe, expect, it } from 'vitest';
import { isFiltered, parseJobListParams, toggleStatus, toJobSearchParams } from './list-params';

const parse = (query: string) => parseJobListParams(new URLSearchParams(query));

describe('job list params', () => {
  it('gives defaults for an empty URL', () => {
    expect(parse('')).toEqual({
      page: 1,
      pageSize: 25,
      sort: '-createdAt',
      q: '',
      status: [],
      from: '',
      to: '',
    });
  });

  it.each([
    ['status=estimated&status=lead', ['lead', 'estimated']],
    ['status=lead,paid', ['lead', 'paid']],
    ['status=nonsense&status=lost', ['lost']],
  ])('reads %s as statuses %j in lifecycle order', (query, statuses) => {
    expect(parse(query).status).toEqual(statuses);
  });

  it('falls back on anything unreadable', () => {
    expect(parse('page=-2&pageSize=7&sort=price&from=yesterday&to=2026-4-1')).toMatchObject({
      page: 1,
      pageSize: 25,
      sort: '-createdAt',
      from: '',
      to: '',
    });
  });

  it('round-trips through the URL, leaving defaults out', () => {
    const params = parse('q=lawn&status=lead&status=estimated&from=2026-03-01&sort=title&page=2');
    const search = toJobSearchParams(params);
    expect(search.toString()).toBe(
      'q=lawn&status=lead&status=estimated&from=2026-03-01&sort=title&page=2',
    );
    expect(parseJobListParams(search)).toEqual(params);
    expect(toJobSearchParams(parse('')).toString()).toBe('');
  });

  it('tells when the list is filtered', () => {
    expect(isFiltered(parse('sort=title&page=3'))).toBe(false);
    expect(isFiltered(parse('status=lead'))).toBe(true);
    expect(isFiltered(parse('to=2026-01-01'))).toBe(true);
  });

  it('toggles a status in and out, in lifecycle order', () => {
    expect(toggleStatus(['estimated'], 'lead')).toEqual(['lead', 'estimated']);
    expect(toggleStatus(['lead', 'estimated'], 'lead')).toEqual(['estimated']);
  });
});
