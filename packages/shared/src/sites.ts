import { z } from 'zod';
import { optionalText, requiredText } from './text.js';

export const createSiteInputSchema = z.object({
  label: optionalText(120).optional(),
  addressLine1: requiredText('Street address', 200),
  addressLine2: optionalText(200).optional(),
  city: requiredText('Town or city', 120),
  region: optionalText(60).optional(),
  postalCode: optionalText(20).optional(),
  accessNotes: optionalText(2000).optional(),
  pets: optionalText(500).optional(),
  hazards: optionalText(2000).optional(),
  sprinklerHeads: z
    .number({ error: 'Sprinkler heads must be a whole number' })
    .int('Sprinkler heads must be a whole number')
    .min(0, 'Sprinkler heads cannot be negative')
    .max(500, 'Sprinkler heads must be at most 500')
    .nullish()
    .transform((value) => value ?? null),
});
export type CreateSiteInput = z.input<typeof createSiteInputSchema>;
export type CreateSiteData = z.output<typeof createSiteInputSchema>;

export const updateSiteInputSchema = createSiteInputSchema
  .partial()
  .refine((value) => Object.keys(value).length > 0, 'Send at least one field to change');
export type UpdateSiteInput = z.input<typeof updateSiteInputSchema>;
export type UpdateSiteData = z.output<typeof updateSiteInputSchema>;

export interface SiteView {
  id: string;
  customerId: string;
  label: string | null;
  addressLine1: string;
  addressLine2: string | null;
  city: string;
  region: string | null;
  postalCode: string | null;
  accessNotes: string | null;
  pets: string | null;
  hazards: string | null;
  sprinklerHeads: number | null;
  createdAt: string;
  updatedAt: string;
}
