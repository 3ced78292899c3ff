// The reminder form's conversions (our own rules, no published source).
import { describe, expect, it } from 'vitest';
import { inputOf, offsetsInWords, parseOffsets, reminderFormSchema } from './reminder-form';

const template = { subject: 'Due {dueDate}', body: 'Pay at {payLink}' };
const values = {
  enabled: true,
  offsets: ' -3, 0 ,7',
  senderName: '',
  templates: { before_due: template, due_day: template, overdue: template },
};

describe('the reminder settings form', () => {
  it('reads typed offsets and says them in words, earliest first', () => {
    expect(parseOffsets(' -3, 0 ,7')).toEqual([-3, 0, 7]);
    expect(offsetsInWords('14, -1, 0')).toEqual([
      '1 day before due',
      'on the due day',
      '14 days overdue',
    ]);
    expect(offsetsInWords('soon')).toEqual([]);
  });

  it('sends numbers, and no sender name for an empty one', () => {
    expect(inputOf(reminderFormSchema.parse(values))).toEqual({
      enabled: true,
      offsets: [-3, 0, 7],
      senderName: null,
      templates: values.templates,
    });
  });

  it('refuses an unknown placeholder and offsets that are not whole days', () => {
    const bad = reminderFormSchema.safeParse({
      ...values,
      offsets: '1.5',
      templates: { ...values.templates, overdue: { ...template, body: 'Hi {name}' } },
    });
    expect(bad.success).toBe(false);
    expect(bad.error?.issues.map((i) => i.path.join('.')).sort()).toEqual([
      'offsets',
      'templates.overdue.body',
    ]);
  });
});
