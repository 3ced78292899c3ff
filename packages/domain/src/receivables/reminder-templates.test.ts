// The reminder template renderer and the schedule's next day. Rules are our own (no published
// source): known placeholders are swapped, unknown ones refused at save time.
import { describe, expect, it } from 'vitest';
import {
  describeReminderOffset,
  dueReminderStep,
  nextReminderOn,
  reminderKindOf,
} from './reminder-schedule.js';
import {
  defaultReminderTemplates,
  reminderTemplateProblem,
  renderReminderTemplate,
  unknownPlaceholders,
} from './reminder-templates.js';

const values = {
  customerName: 'Ada Quill',
  invoiceNumber: 'INV-0042',
  amountDue: '$1,250.00',
  dueDate: 'January 31, 2027',
  payLink: 'http://127.0.0.1/i/abc',
  companyName: 'Greenline Turf',
};

describe('reminder templates', () => {
  it('swaps every known placeholder, each time it appears', () => {
    expect(
      renderReminderTemplate(
        '{customerName}, {amountDue} on {invoiceNumber} ({amountDue})',
        values,
      ),
    ).toBe('Ada Quill, $1,250.00 on INV-0042 ($1,250.00)');
  });

  it('keeps doubled braces as literal braces and never evaluates anything', () => {
    expect(renderReminderTemplate('{{customerName}} {dueDate}', values)).toBe(
      '{customerName} January 31, 2027',
    );
    expect(renderReminderTemplate('{constructor} {__proto__}', values)).toBe(
      '{constructor} {__proto__}',
    );
  });

  it('does not re-read a value that itself contains braces', () => {
    expect(renderReminderTemplate('{customerName}', { ...values, customerName: '{payLink}' })).toBe(
      '{payLink}',
    );
  });

  it('names unknown placeholders once each, in order', () => {
    expect(unknownPlaceholders('{custmerName} {total} {custmerName} {dueDate}')).toEqual([
      'custmerName',
      'total',
    ]);
    expect(unknownPlaceholders('{{literal}} {}')).toEqual(['']);
    expect(reminderTemplateProblem('Hi {custmerName}')).toMatch(
      /Unknown placeholder \{custmerName\}/,
    );
    expect(reminderTemplateProblem('Hi {customerName}')).toBeNull();
  });

  it('ships default templates that use only known placeholders', () => {
    for (const template of Object.values(defaultReminderTemplates)) {
      expect(reminderTemplateProblem(template.subject)).toBeNull();
      expect(reminderTemplateProblem(template.body)).toBeNull();
      expect(template.body).toContain('{payLink}');
    }
  });
});

describe('the next reminder day', () => {
  const offsets = [-3, 0, 7, 14, 30];
  const base = { offsets, dueDate: '2027-01-31', sentOn: '2027-01-17' };

  it('is the first step on or after sending, then the one after the latest sent', () => {
    expect(nextReminderOn({ ...base, alreadySentOffsets: [] })).toBe('2027-01-28');
    expect(nextReminderOn({ ...base, alreadySentOffsets: [-3] })).toBe('2027-01-31');
    expect(nextReminderOn({ ...base, alreadySentOffsets: [-3, 0, 14] })).toBe('2027-03-02');
    expect(nextReminderOn({ ...base, alreadySentOffsets: [30] })).toBeNull();
  });

  it('skips steps before the invoice was sent', () => {
    expect(nextReminderOn({ ...base, sentOn: '2027-02-05', alreadySentOffsets: [] })).toBe(
      '2027-02-07',
    );
  });

  it('always names a day on which dueReminderStep finds a step', () => {
    for (const sent of [[], [-3], [-3, 0], [7], [14]]) {
      const day = nextReminderOn({ ...base, alreadySentOffsets: sent });
      if (day === null) continue;
      expect(dueReminderStep({ ...base, today: day, alreadySentOffsets: sent })).not.toBeNull();
    }
  });

  it('names kinds and words for steps', () => {
    expect([-3, 0, 7].map(reminderKindOf)).toEqual(['before_due', 'due_day', 'overdue']);
    expect([-3, -1, 0, 7].map(describeReminderOffset)).toEqual([
      '3 days before due',
      '1 day before due',
      'on the due day',
      '7 days overdue',
    ]);
  });
});
