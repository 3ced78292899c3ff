import { describe, expect, it } from 'vitest';
import { sampleEstimate } from '../test/sample-estimate';
import { lineRowsOf, lineRowsSchema, lineUpdatesOf, newLineOf, newLineSchema } from './line-edits';

const lines = sampleEstimate().lines;

describe('line edits', () => {
  it('sends only what changed, so an untouched takeoff line stays from the takeoff', () => {
    const rows = lineRowsOf(lines);
    expect(rows.map((r) => [r.quantity, r.unitPrice])).toEqual([
      ['600', '2.40'],
      ['1', '45.00'],
    ]);
    expect(lineUpdatesOf(lines, rows)).toEqual([]);
    const [first, second] = rows;
    const changed = [
      { ...first!, quantity: '650.5' },
      { ...second!, unitPrice: '$47.5' },
    ];
    expect(lineUpdatesOf(lines, changed)).toEqual([
      { id: lines[0]!.id, quantity: 650.5 },
      { id: lines[1]!.id, unitPriceCents: 4750 },
    ]);
  });

  it('refuses quantities and prices the server could not keep exactly', () => {
    const row = { id: 'x', quantity: '1.1234567', unitPrice: '2.40' };
    expect(lineRowsSchema.safeParse({ rows: [row] }).success).toBe(false);
    expect(lineRowsSchema.safeParse({ rows: [{ ...row, quantity: '1.123456' }] }).success).toBe(
      true,
    );
    expect(
      lineRowsSchema.safeParse({ rows: [{ ...row, quantity: '1', unitPrice: '2.405' }] }).success,
    ).toBe(false);
  });

  it('turns a typed line into the API’s lines.add entry, in cents', () => {
    const values = newLineSchema.parse({
      label: ' Gate removal ',
      quantity: '2',
      unit: 'ea',
      unitPrice: '1,185.5',
      taxable: false,
    });
    expect(newLineOf(values, 'tier-1')).toEqual({
      tierId: 'tier-1',
      label: 'Gate removal',
      quantity: 2,
      unit: 'ea',
      unitPriceCents: 118_550,
      taxable: false,
    });
  });
});
