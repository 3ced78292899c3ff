// Receivables and the owner's numbers: query schemas and answer shapes of the aging report,
// the CSV exports and the dashboard (issue 10, items 4 and 5). Money is integer cents.
import { z } from 'zod';
import type { AgingBuckets } from '@seamwright/domain';

const isoDate = (field: string) =>
  z.iso.date({ error: `${field}: use a calendar day like 2026-04-30` });

export const agingQuerySchema = z.object({ asOf: isoDate('asOf').optional() });
export type AgingQuery = z.output<typeof agingQuerySchema>;

export type { AgingBuckets } from '@seamwright/domain';

export interface CustomerAgingView {
  customerId: string;
  name: string;
  buckets: AgingBuckets;
  totalCents: number;
}

export interface AgingReportView {
  asOf: string;
  buckets: AgingBuckets;
  totalCents: number;
  customers: CustomerAgingView[];
}

/** A date range in the company's calendar days, both ends included; `to` not before `from`. */
const rangeShape = { from: isoDate('from').optional(), to: isoDate('to').optional() };
const toAfterFrom = (v: { from?: string | undefined; to?: string | undefined }) =>
  !v.from || !v.to || v.from <= v.to;

export const exportQuerySchema = z
  .object(rangeShape)
  .refine(toAfterFrom, { path: ['to'], message: 'to: the range ends before it starts' });
export type ExportQuery = z.output<typeof exportQuerySchema>;

export const dashboardQuerySchema = z
  .object({ ...rangeShape, crewId: z.uuid({ error: 'crewId: not a crew id' }).optional() })
  .refine(toAfterFrom, { path: ['to'], message: 'to: the range ends before it starts' });
export type DashboardQuery = z.output<typeof dashboardQuerySchema>;

export interface MonthAmount {
  /** `YYYY-MM`. */
  month: string;
  cents: number;
}

export interface PipelineRow {
  status: string;
  jobs: number;
  /** Total of each job's latest estimate version (0 for a job without one). */
  valueCents: number;
}

export interface DashboardView {
  from: string;
  to: string;
  crewId: string | null;
  invoicedByMonth: MonthAmount[];
  collectedByMonth: MonthAmount[];
  pipeline: PipelineRow[];
  winRate: {
    accepted: number;
    declined: number;
    expired: number;
    rate: number | null;
    rule: string;
  };
  installed: {
    jobs: number;
    sqFt: number;
    valueCents: number;
    /** Whole cents per sq ft, half-up; null without installed area. */
    averageCentsPerSqFt: number | null;
    rule: string;
  };
  material: {
    jobs: number;
    estimatedSqFt: number;
    actualSqFt: number;
    /** estimated − actual: positive when the crews used less than the plan allowed. */
    marginSqFt: number;
    /** marginSqFt / estimatedSqFt in basis points; null without an estimate. */
    marginBasisPoints: number | null;
    rule: string;
  };
  /** null until bookings exist (see apps/api/src/modules/dashboard/crew-utilisation.query.ts). */
  crewUtilisation: {
    bookedCrewDays: number;
    availableCrewDays: number;
    rate: number | null;
  } | null;
  waterSaved: {
    region: string | null;
    gallonsPerYear: number | null;
    rule: {
      label: string;
      lawnGallonsPerSqFtYear: number;
      replacementGallonsPerSqFtYear: number;
      source: string;
    } | null;
    note: string;
  };
}

export const sendStatementInputSchema = z.object({
  to: z.email({ error: 'Enter a valid e-mail address' }).optional(),
});
export type SendStatementInput = z.output<typeof sendStatementInputSchema>;

export interface StatementSentView {
  to: string;
  asOf: string;
  balanceCents: number;
}
