import { describe, expect, it } from 'vitest';
import { parseReportParams, periodQuery, reportSearch } from './report-params';

describe('report params', () => {
  it('keeps calendar days and a crew id, drops anything else', () => {
    const params = parseReportParams(
      new URLSearchParams('from=2026-01-01&to=junk&crewId=11111111-2222-3333-4444-555555555555'),
    );
    expect(params).toEqual({
      page: 1,
      from: '2026-01-01',
      to: null,
      crewId: '11111111-2222-3333-4444-555555555555',
    });
    expect(reportSearch(params).toString()).toBe(
      'from=2026-01-01&crewId=11111111-2222-3333-4444-555555555555',
    );
    expect(periodQuery(params, false)).toBe('?from=2026-01-01');
    expect(periodQuery({ page: 1, from: null, to: null, crewId: null }, true)).toBe('');
  });
});
