import type { EstimateLine, UpdateEstimateInput } from '@seamwright/shared';
import { z } from 'zod';
import { centsInputValue, parseCents } from '../../../lib/money';

/** A number as typed in a quantity box: at most 6 decimals (what the pricing keeps exactly). */
export const quantityText = z
  .string()
  .trim()
  .regex(/^\d{1,8}(\.\d{1,6})?$/, 'Type a quantity such as 12 or 452.25');

/** Money as typed: dollars and cents, `$` and thousands commas allowed. */
export const moneyText = z
  .string()
  .refine((text) => parseCents(text) !== null, 'Type an amount such as 2.76 or 1,250');

/** One row of the editable lines table. */
export const lineRowSchema = z.object({
  id: z.string(),
  quantity: quantityText,
  unitPrice: moneyText,
});
export const lineRowsSchema = z.object({ rows: z.array(lineRowSchema) });
export type LineRow = z.infer<typeof lineRowSchema>;

/** The starting values of a tier's editable rows. */
export function lineRowsOf(lines: readonly EstimateLine[]): LineRow[] {
  return lines.map((line) => ({
    id: line.id,
    quantity: String(line.quantity),
    unitPrice: centsInputValue(line.unitPriceCents),
  }));
}

/**
 * The `lines.update` entries for rows whose quantity or unit price differ from the saved line;
 * only what changed is sent, so an untouched takeoff line stays `takeoff`.
 */
export function lineUpdatesOf(
  lines: readonly EstimateLine[],
  rows: readonly LineRow[],
): NonNullable<NonNullable<UpdateEstimateInput['lines']>['update']> {
  const byId = new Map(lines.map((line) => [line.id, line]));
  return rows.flatMap((row) => {
    const line = byId.get(row.id);
    if (!line) return [];
    const quantity = Number(row.quantity);
    const unitPriceCents = parseCents(row.unitPrice);
    const change: { id: string; quantity?: number; unitPriceCents?: number } = { id: row.id };
    if (quantity !== line.quantity) change.quantity = quantity;
    if (unitPriceCents !== null && unitPriceCents !== line.unitPriceCents)
      change.unitPriceCents = unitPriceCents;
    return Object.keys(change).length > 1 ? [change] : [];
  });
}

/** "Add a line by hand": what is typed, checked as it is typed. */
export const newLineSchema = z.object({
  label: z.string().trim().min(1, 'Say what the line is').max(200, 'At most 200 characters'),
  quantity: quantityText,
  unit: z
    .string()
    .trim()
    .min(1, 'Give a unit, such as job or sq ft')
    .max(20, 'At most 20 characters'),
  unitPrice: moneyText,
  taxable: z.boolean(),
});
export type NewLineValues = z.infer<typeof newLineSchema>;

/** The `lines.add` entry for a typed line, to the given tier. */
export function newLineOf(values: NewLineValues, tierId: string) {
  return {
    tierId,
    label: values.label,
    quantity: Number(values.quantity),
    unit: values.unit,
    // The schema refused anything parseCents cannot read.
    unitPriceCents: parseCents(values.unitPrice) ?? 0,
    taxable: values.taxable,
  };
}
