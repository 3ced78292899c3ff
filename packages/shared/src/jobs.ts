import { z } from 'zod';
import { jobStatuses } from '@seamwright/domain';
import type { JobStatus } from '@seamwright/domain';
import { pageQuerySchema, sortSchema } from './list.js';
import { requiredText } from './text.js';

// The status list itself lives in @seamwright/domain with the lifecycle rules; the contract
// re-exports it so clients have one import for the API's words.
export { jobStatuses, jobStatusLabels, allowedNextStatuses } from '@seamwright/domain';
export type { JobStatus } from '@seamwright/domain';

const uuid = (label: string) =>
  z.uuid({ error: `Choose a ${label}` }).transform((value) => value.toLowerCase());

/** A job's title: what the work is, as people say it. */
export const jobTitleSchema = requiredText('Title', 200);

export const createJobInputSchema = z.object({
  customerId: uuid('customer'),
  siteId: uuid('site'),
  title: jobTitleSchema,
});
export type CreateJobInput = z.input<typeof createJobInputSchema>;
export type CreateJobData = z.output<typeof createJobInputSchema>;

export const updateJobInputSchema = z
  .object({
    title: jobTitleSchema.optional(),
    status: z.enum(jobStatuses, { error: 'Choose a job status' }).optional(),
  })
  .refine((value) => Object.keys(value).length > 0, 'Send at least one field to change');
export type UpdateJobInput = z.input<typeof updateJobInputSchema>;
export type UpdateJobData = z.output<typeof updateJobInputSchema>;

export const jobSortFields = ['createdAt', 'updatedAt', 'title', 'status'] as const;

const isoDate = z.iso.date({ error: 'Use a date like 2026-04-30' });

/** `status=lead&status=estimated` or `status=lead,estimated`; empty means every status. */
const statusFilter = z
  .union([z.string(), z.array(z.string())])
  .optional()
  .transform((raw) =>
    (Array.isArray(raw) ? raw : raw ? [raw] : []).flatMap((s) => s.split(',')).filter(Boolean),
  )
  .pipe(z.array(z.enum(jobStatuses, { error: 'Unknown job status' })));

export const jobListQuerySchema = pageQuerySchema
  .extend({
    q: z.string().trim().max(100).optional(),
    status: statusFilter,
    /** First and last day of the created date (UTC days), inclusive. */
    from: isoDate.optional(),
    to: isoDate.optional(),
    sort: sortSchema(jobSortFields, '-createdAt'),
  })
  .refine((v) => !v.from || !v.to || v.from <= v.to, {
    path: ['to'],
    message: 'The end date must not be before the start date',
  });
export type JobListQuery = z.output<typeof jobListQuerySchema>;

export interface JobCustomerSummary {
  id: string;
  name: string;
}

export interface JobSiteSummary {
  id: string;
  label: string | null;
  addressLine1: string;
  city: string;
}

export interface JobView {
  id: string;
  title: string;
  status: JobStatus;
  /** The moves the lifecycle allows from `status` (the server refuses any other). */
  allowedNextStatuses: JobStatus[];
  customerId: string;
  siteId: string;
  customer: JobCustomerSummary;
  site: JobSiteSummary;
  createdAt: string;
  updatedAt: string;
}

/** One line of a job's activity, from the audit log. */
export interface JobActivityView {
  id: string;
  action: string;
  userName: string | null;
  data: Record<string, unknown> | null;
  createdAt: string;
}

export interface JobDetailView extends JobView {
  activity: JobActivityView[];
}
