// The reminder settings form: offsets typed as one line of whole days ("-3, 0, 7"), templates
// per kind of step. The server checks the placeholders again and names the field.
import { z } from 'zod';
import type {
  ReminderKindName,
  ReminderSettingsData,
  ReminderSettingsView,
} from '@seamwright/shared';
import { describeReminderOffset, unknownPlaceholders } from '@seamwright/domain';

const offsetsPattern = /^\s*(-?\d+\s*(,\s*-?\d+\s*)*)?$/;

const templateText = (what: string, max: number) =>
  z
    .string()
    .trim()
    .min(1, `The ${what} must not be empty`)
    .max(max, `The ${what} is at most ${max} characters`)
    .refine((text) => unknownPlaceholders(text).length === 0, {
      message: 'Use only the placeholders listed below',
    });

const templateSchema = z.object({
  subject: templateText('subject', 200),
  body: templateText('body', 5000),
});

export const reminderFormSchema = z.object({
  enabled: z.boolean(),
  offsets: z.string().regex(offsetsPattern, 'Whole days separated by commas, e.g. -3, 0, 7'),
  senderName: z.string().trim().max(120, 'At most 120 characters'),
  templates: z.object({
    before_due: templateSchema,
    due_day: templateSchema,
    overdue: templateSchema,
  }),
});
export type ReminderFormValues = z.input<typeof reminderFormSchema>;

export const kindLabels: Record<ReminderKindName, { title: string; hint: string }> = {
  before_due: { title: 'Before the due day', hint: 'For steps with a negative number of days.' },
  due_day: { title: 'On the due day', hint: 'For the step at 0 days.' },
  overdue: { title: 'Overdue', hint: 'For every step after the due day.' },
};

/** "-3, 0, 7" → [-3, 0, 7]; anything else the schema already refused. */
export function parseOffsets(text: string): number[] {
  return text
    .split(',')
    .map((part) => part.trim())
    .filter((part) => part !== '')
    .map(Number);
}

/** The schedule in words, earliest first; duplicates are for the server to refuse. */
export function offsetsInWords(text: string): string[] {
  if (!offsetsPattern.test(text)) return [];
  return parseOffsets(text)
    .sort((a, b) => a - b)
    .map(describeReminderOffset);
}

export function formValuesOf(view: ReminderSettingsView): ReminderFormValues {
  return {
    enabled: view.enabled,
    offsets: view.offsets.join(', '),
    senderName: view.senderName ?? '',
    templates: view.templates,
  };
}

export function inputOf(values: z.output<typeof reminderFormSchema>): ReminderSettingsData {
  return {
    enabled: values.enabled,
    offsets: parseOffsets(values.offsets),
    senderName: values.senderName === '' ? null : values.senderName,
    templates: values.templates,
  };
}

/** Invented values for the preview. */
export const previewValues = {
  customerName: 'Robin Fairweather',
  invoiceNumber: 'INV-000042',
  amountDue: '$1,250.00',
  dueDate: 'January 31, 2027',
  payLink: 'https://example.test/i/your-private-link',
  companyName: 'Your company',
};
