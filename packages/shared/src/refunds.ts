// Refunds of card payments (owner only), through the processor.
import { z } from 'zod';

export const refundInputSchema = z.object({
  /** Absent: all that is left of the payment. */
  amountCents: z
    .number({ error: 'The amount must be a number of cents' })
    .int('The amount must be a whole number of cents')
    .min(1, 'The amount must be more than 0')
    .max(100_000_000_000, 'The amount is too large')
    .optional(),
  reason: z.string().trim().min(1, 'Say why the money is given back').max(500),
});
export type RefundData = z.output<typeof refundInputSchema>;

export interface RefundView {
  id: string;
  paymentId: string;
  amountCents: number;
  reason: string;
  processorRefundId: string;
  createdAt: string;
}
