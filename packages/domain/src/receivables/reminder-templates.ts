// Reminder e-mail templates: plain text with a small set of `{placeholder}` names of our own.
// The renderer only swaps known names for values (no expressions, no HTML), and a template
// with an unknown name is refused when it is saved, so a typo never reaches a customer as
// "{custmerName}".
import type { ReminderKind } from './reminder-schedule.js';

export const reminderPlaceholders = [
  'customerName',
  'invoiceNumber',
  'amountDue',
  'dueDate',
  'payLink',
  'companyName',
] as const;
export type ReminderPlaceholder = (typeof reminderPlaceholders)[number];
export type ReminderValues = Record<ReminderPlaceholder, string>;

export interface ReminderTemplate {
  subject: string;
  body: string;
}
export type ReminderTemplates = Record<ReminderKind, ReminderTemplate>;

export const reminderTemplateKinds: readonly ReminderKind[] = ['before_due', 'due_day', 'overdue'];

/** Anything in braces that looks like a name; `{{` and `}}` stand for literal braces. */
const placeholderPattern = /\{\{|\}\}|\{([^{}]*)\}/g;

/** Names used in `text` that are not ours, in order of first use (empty: the text is fine). */
export function unknownPlaceholders(text: string): string[] {
  const unknown: string[] = [];
  for (const match of text.matchAll(placeholderPattern)) {
    const name = match[1];
    if (name === undefined) continue;
    if (!(reminderPlaceholders as readonly string[]).includes(name) && !unknown.includes(name))
      unknown.push(name);
  }
  return unknown;
}

/** Why a template text cannot be saved, or null. */
export function reminderTemplateProblem(text: string): string | null {
  const unknown = unknownPlaceholders(text);
  if (unknown.length === 0) return null;
  const names = unknown.map((n) => `{${n}}`).join(', ');
  return `Unknown placeholder ${names}: use ${reminderPlaceholders.map((n) => `{${n}}`).join(', ')}`;
}

/**
 * Fills a template. Values go in as they are (the caller escapes for HTML); an unknown name,
 * which saving refuses, is left as written rather than guessed at.
 */
export function renderReminderTemplate(text: string, values: ReminderValues): string {
  return text.replace(placeholderPattern, (whole, name: string | undefined) => {
    if (whole === '{{') return '{';
    if (whole === '}}') return '}';
    return name !== undefined && Object.hasOwn(values, name)
      ? values[name as ReminderPlaceholder]
      : whole;
  });
}

/** What a company starts with; our own plain words. */
export const defaultReminderTemplates: ReminderTemplates = {
  before_due: {
    subject: 'Invoice {invoiceNumber} is due on {dueDate}',
    body:
      'Hello {customerName},\n\n' +
      'A friendly note from {companyName}: invoice {invoiceNumber} for {amountDue} is due on {dueDate}.\n\n' +
      'You can see it and pay it here: {payLink}\n\n' +
      'If you have paid already, thank you, and please ignore this message.\n\n' +
      '{companyName}',
  },
  due_day: {
    subject: 'Invoice {invoiceNumber} is due today',
    body:
      'Hello {customerName},\n\n' +
      'Invoice {invoiceNumber} for {amountDue} is due today, {dueDate}.\n\n' +
      'You can pay it here: {payLink}\n\n' +
      'If your payment is on its way, thank you, and please ignore this message.\n\n' +
      '{companyName}',
  },
  overdue: {
    subject: 'Invoice {invoiceNumber} is overdue',
    body:
      'Hello {customerName},\n\n' +
      'Our records show {amountDue} still open on invoice {invoiceNumber}, which was due on {dueDate}.\n\n' +
      'You can pay it here: {payLink}\n\n' +
      'If something is not right with the invoice, just reply and we will sort it out together.\n\n' +
      '{companyName}',
  },
};
