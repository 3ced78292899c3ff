import { useState } from 'react';
import { useWatch } from 'react-hook-form';
import { reminderKinds } from '@seamwright/shared';
import { Form, SubmitButton, TextField } from '../../../components/ui/form';
import { useBoundField } from '../../../components/ui/form/fields';
import { FormNotice } from '../../../components/ui/form-alert';
import { useReminderSettings, useSaveReminderSettings } from '../api/reminder-settings';
import { formValuesOf, inputOf, offsetsInWords, reminderFormSchema } from '../utils/reminder-form';
import { ReminderTemplateEditor } from './reminder-template-editor';

function EnabledField() {
  const { registration } = useBoundField('enabled');
  return (
    <label className="flex min-h-11 items-center gap-2 font-semibold">
      <input type="checkbox" className="h-5 w-5" {...registration} />
      Send payment reminders
    </label>
  );
}

/** The typed schedule read back in words, so "-3" is seen to mean "3 days before due". */
function ScheduleInWords() {
  const offsets = useWatch({ name: 'offsets' }) as string;
  const words = offsetsInWords(offsets ?? '');
  return words.length > 0 ? (
    <ol aria-label="Schedule" className="flex flex-wrap gap-2">
      {words.map((word, index) => (
        <li key={`${word}-${index}`} className="rounded-full bg-moss-100 px-3 py-1 text-sm">
          {word}
        </li>
      ))}
    </ol>
  ) : (
    <p className="text-sm text-ink-muted">No reminders are scheduled.</p>
  );
}

/** Settings → Payment reminders: the schedule, on/off, the From name and the wording. */
export function ReminderSettingsPanel({ companyName }: { companyName: string }) {
  const settings = useReminderSettings();
  const save = useSaveReminderSettings();
  const [saved, setSaved] = useState(false);
  return (
    <Form
      schema={reminderFormSchema}
      defaultValues={formValuesOf(settings)}
      aria-label="Payment reminders"
      onSubmit={async (values, form) => {
        setSaved(false);
        const view = await save.mutateAsync(inputOf(values));
        form.reset(formValuesOf(view));
        setSaved(true);
      }}
    >
      {saved ? <FormNotice>Reminder settings saved.</FormNotice> : null}
      <div className="flex flex-col gap-4 rounded-lg border border-line bg-white p-4">
        <EnabledField />
        <TextField
          name="offsets"
          label="When to send (days from the due date)"
          hint="Negative numbers are before the due day, 0 is the day itself: -3, 0, 7, 14, 30."
          inputMode="text"
          autoComplete="off"
        />
        <ScheduleInWords />
        <TextField
          name="senderName"
          label="Sender name"
          hint={`Shown as who the e-mail is from. Empty: ${companyName}.`}
          autoComplete="off"
        />
      </div>
      <div className="rounded-lg border border-line bg-white p-4 text-sm">
        <p className="font-semibold">Placeholders you can use</p>
        <p className="mt-1 text-ink-muted">
          {settings.placeholders.map((name) => `{${name}}`).join('  ')}
        </p>
        <p className="mt-1 text-ink-muted">
          Each reminder carries a new private pay link in {'{payLink}'}.
        </p>
      </div>
      {reminderKinds.map((kind) => (
        <ReminderTemplateEditor key={kind} kind={kind} companyName={companyName} />
      ))}
      <div>
        <SubmitButton>Save reminder settings</SubmitButton>
      </div>
    </Form>
  );
}
