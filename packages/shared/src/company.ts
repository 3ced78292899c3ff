import { z } from 'zod';
import { optionalText, requiredText } from './text.js';

/** IANA time-zone names such as `America/Denver`; checked against the runtime's own list. */
export const timeZoneSchema = z
  .string()
  .trim()
  .refine((value) => {
    try {
      new Intl.DateTimeFormat('en-US', { timeZone: value });
      return true;
    } catch {
      return false;
    }
  }, 'Choose a known time zone, such as America/Denver');

/** Every editable detail of the company, as the settings form sends them all. */
export const companyDetailsSchema = z.object({
  name: requiredText('Company name', 120),
  timeZone: timeZoneSchema,
  region: optionalText(8),
  /** The postal address as it prints on estimates and invoices (several lines). */
  address: optionalText(500),
  measurementSystem: z.enum(['imperial', 'metric']),
});
export type CompanyDetails = z.infer<typeof companyDetailsSchema>;

/** `PATCH /api/company`: any of the details; fields left out stay as they are. */
export const updateCompanyInputSchema = companyDetailsSchema.partial();
export type UpdateCompanyInput = z.infer<typeof updateCompanyInputSchema>;

/** `GET /api/company` and `PATCH /api/company`: the company with its editable details. */
export interface CompanySettingsView {
  id: string;
  name: string;
  slug: string;
  address: string | null;
  timeZone: string;
  region: string | null;
  currency: string;
  measurementSystem: 'imperial' | 'metric';
}
