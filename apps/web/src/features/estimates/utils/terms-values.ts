import { z } from 'zod';
import type { DepositRule, EstimateView, UpdateEstimateInput } from '@seamwright/shared';
import { centsInputValue, parseCents } from '../../../lib/money';

/** The terms form: validity, deposit rule (percent or amount) and notes, as typed. */
export const termsSchema = z
  .object({
    validUntil: z.union([z.literal(''), z.iso.date({ error: 'Use a date like 2026-04-30' })]),
    depositKind: z.enum(['percent', 'amount']),
    depositPercent: z.string().trim(),
    depositAmount: z.string().trim(),
    notes: z.string().max(4000, 'At most 4,000 characters'),
  })
  .superRefine((values, ctx) => {
    if (values.depositKind === 'percent' && percentToBasisPoints(values.depositPercent) === null)
      ctx.addIssue({
        code: 'custom',
        path: ['depositPercent'],
        message: 'Type a percent from 0 to 100, such as 30 or 12.5',
      });
    if (values.depositKind === 'amount' && parseCents(values.depositAmount) === null)
      ctx.addIssue({
        code: 'custom',
        path: ['depositAmount'],
        message: 'Type an amount such as 500 or 1,250.00',
      });
  });
export type TermsValues = z.infer<typeof termsSchema>;

/** "12.5" → 1250 basis points (exact: at most two decimals), or null. */
export function percentToBasisPoints(text: string): number | null {
  const match = /^(\d{1,3})(?:\.(\d{1,2}))?$/.exec(text.trim());
  if (!match) return null;
  const basisPoints = Number(match[1]) * 100 + Number((match[2] ?? '').padEnd(2, '0'));
  return basisPoints <= 10_000 ? basisPoints : null;
}

export function termsDefaults(estimate: EstimateView): TermsValues {
  const rule = estimate.depositRule;
  return {
    validUntil: estimate.validUntil ?? '',
    depositKind: rule.kind,
    depositPercent: rule.kind === 'percent' ? String(rule.basisPoints / 100) : '',
    depositAmount: rule.kind === 'amount' ? centsInputValue(rule.cents) : '',
    notes: estimate.notes ?? '',
  };
}

/** The PATCH body for the terms (all three sent: the server compares nothing for us). */
export function termsPatchOf(values: TermsValues): UpdateEstimateInput {
  const depositRule: DepositRule =
    values.depositKind === 'percent'
      ? { kind: 'percent', basisPoints: percentToBasisPoints(values.depositPercent) ?? 0 }
      : { kind: 'amount', cents: parseCents(values.depositAmount) ?? 0 };
  return {
    validUntil: values.validUntil || null,
    depositRule,
    notes: values.notes.trim() || null,
  };
}
