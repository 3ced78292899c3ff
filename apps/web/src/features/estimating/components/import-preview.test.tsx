import { describe, expect, it } from 'vitest';
import { render, screen, within } from '@testing-library/react';
import type { PriceBookImportPreview } from '@seamwright/shared';
import { ImportPreview } from './import-preview';

const preview: PriceBookImportPreview = {
  imported: false,
  summary: { total: 2, create: 1, update: 1, withErrors: 1 },
  rows: [
    {
      line: 2,
      action: 'update',
      raw: {},
      errors: [],
      item: {
        kind: 'material',
        key: 'base-stone',
        name: 'Crushed base stone',
        unit: 'ton',
        packSize: null,
        priceMillicents: 4_150_000,
        isStarter: false,
        attributes: {},
      },
    },
    {
      line: 3,
      action: 'create',
      raw: { key: 'labour-day', name: 'Day rate', price: 'abc' },
      item: null,
      errors: [{ field: 'price', message: 'Enter a price like 2.35' }],
    },
  ],
};

describe('ImportPreview', () => {
  it('lists every row with its action, price in the company currency and its errors by column', () => {
    render(<ImportPreview preview={preview} currency="USD" />);
    expect(screen.getByRole('status').textContent).toContain('1 with errors');
    const rows = screen.getAllByRole('row');
    expect(within(rows[1]!).getByText('Update')).toBeTruthy();
    expect(within(rows[1]!).getByText('$41.50')).toBeTruthy();
    expect(within(rows[1]!).getByText('OK')).toBeTruthy();
    expect(within(rows[2]!).getByText('labour-day')).toBeTruthy();
    expect(within(rows[2]!).getByText('abc')).toBeTruthy();
    expect(within(rows[2]!).getByText('price')).toBeTruthy();
    expect(within(rows[2]!).getByText(/Enter a price like 2.35/)).toBeTruthy();
  });
});
