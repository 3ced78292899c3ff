import { z } from 'zod';
import { pageQuerySchema, sortSchema } from './list.js';
import { optionalEmailSchema, optionalPhoneSchema, optionalText, requiredText } from './text.js';

export const createCustomerInputSchema = z.object({
  name: requiredText('Name', 200),
  email: optionalEmailSchema.optional(),
  phone: optionalPhoneSchema.optional(),
  billingAddress: optionalText(500).optional(),
  notes: optionalText(2000).optional(),
});
export type CreateCustomerInput = z.input<typeof createCustomerInputSchema>;
export type CreateCustomerData = z.output<typeof createCustomerInputSchema>;

export const updateCustomerInputSchema = createCustomerInputSchema
  .partial()
  .extend({ archived: z.boolean().optional() })
  .refine((value) => Object.keys(value).length > 0, 'Send at least one field to change');
export type UpdateCustomerInput = z.input<typeof updateCustomerInputSchema>;
export type UpdateCustomerData = z.output<typeof updateCustomerInputSchema>;

export const customerSortFields = ['name', 'createdAt', 'updatedAt'] as const;
export const customerStatuses = ['active', 'archived', 'all'] as const;

export const customerListQuerySchema = pageQuerySchema.extend({
  q: z.string().trim().max(100).optional(),
  status: z.enum(customerStatuses).default('active'),
  sort: sortSchema(customerSortFields, 'name'),
});
export type CustomerListQuery = z.output<typeof customerListQuerySchema>;

export interface CustomerView {
  id: string;
  name: string;
  /** Billing details are left out (null) for roles that may not see them. */
  email: string | null;
  phone: string | null;
  billingAddress: string | null;
  notes: string | null;
  siteCount: number;
  archivedAt: string | null;
  createdAt: string;
  updatedAt: string;
}
