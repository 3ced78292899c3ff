import { describe, expect, it } from 'vitest';
import { parseInvoiceListParams, toInvoiceSearchParams, toggleInvoiceStatus } from './list-params';

describe('invoice list params', () => {
  it('reads statuses from the URL, dropping unknown ones, and writes them back', () => {
    const params = parseInvoiceListParams(
      new URLSearchParams('status=overdue&status=late,sent&page=2'),
    );
    expect(params).toEqual({ page: 2, pageSize: 25, status: ['sent', 'overdue'] });
    expect(toInvoiceSearchParams(params).toString()).toBe('status=sent&status=overdue&page=2');
  });

  it('toggles a status in the statuses’ own order', () => {
    expect(toggleInvoiceStatus(['overdue'], 'draft')).toEqual(['draft', 'overdue']);
    expect(toggleInvoiceStatus(['draft', 'overdue'], 'draft')).toEqual(['overdue']);
  });
});
