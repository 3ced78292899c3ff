// Payment reminders: the company's schedule and templates, and the log of reminders sent.
import { z } from 'zod';

export const reminderKinds = ['before_due', 'due_day', 'overdue'] as const;
export type ReminderKindName = (typeof reminderKinds)[number];

const templateSchema = z.object({
  subject: z
    .string({ error: 'The subject is text' })
    .trim()
    .min(1, 'The subject must not be empty')
    .max(200, 'The subject is at most 200 characters'),
  body: z
    .string({ error: 'The body is text' })
    .trim()
    .min(1, 'The body must not be empty')
    .max(5000, 'The body is at most 5000 characters'),
});

/** PUT /api/settings/reminders: the whole settings (templates may be given per kind). */
export const reminderSettingsInputSchema = z.object({
  enabled: z.boolean({ error: 'enabled is true or false' }),
  offsets: z
    .array(z.number({ error: 'Each step is a number of days' }), {
      error: 'The steps are a list of day offsets',
    })
    .max(12, 'A schedule has at most 12 steps'),
  senderName: z
    .string({ error: 'The sender name is text' })
    .trim()
    .max(120, 'The sender name is at most 120 characters')
    .nullish(),
  templates: z
    .object({
      before_due: templateSchema.optional(),
      due_day: templateSchema.optional(),
      overdue: templateSchema.optional(),
    })
    .strict()
    .default({}),
});
export type ReminderSettingsData = z.output<typeof reminderSettingsInputSchema>;

export interface ReminderTemplateView {
  subject: string;
  body: string;
}

export interface ReminderSettingsView {
  enabled: boolean;
  offsets: number[];
  /** Shown as the From name; null means the company's name. */
  senderName: string | null;
  templates: Record<ReminderKindName, ReminderTemplateView>;
  placeholders: string[];
  defaults: { offsets: number[]; templates: Record<ReminderKindName, ReminderTemplateView> };
}

export interface InvoiceReminderView {
  id: string;
  kind: 'manual' | 'scheduled';
  /** The schedule step (days from the due date); null for a manual reminder. */
  offsetDays: number | null;
  dueOn: string | null;
  sentAt: string | null;
  messageId: string | null;
  toAddress: string;
  error: string | null;
}

export const sendReminderInputSchema = z.object({
  to: z.email({ error: 'Not an e-mail address' }).optional(),
});
