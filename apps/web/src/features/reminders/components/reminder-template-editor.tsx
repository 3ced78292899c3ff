import { useWatch } from 'react-hook-form';
import type { ReminderKindName } from '@seamwright/shared';
import { renderReminderTemplate } from '@seamwright/domain';
import { TextAreaField, TextField } from '../../../components/ui/form';
import { kindLabels, previewValues } from '../utils/reminder-form';

/** Subject and body of one kind of step, with the message as the customer would read it. */
export function ReminderTemplateEditor({
  kind,
  companyName,
}: {
  kind: ReminderKindName;
  companyName: string;
}) {
  const template = useWatch({ name: `templates.${kind}` }) as
    { subject?: string; body?: string } | undefined;
  const values = { ...previewValues, companyName };
  const { title, hint } = kindLabels[kind];
  return (
    <fieldset className="grid gap-4 rounded-lg border border-line bg-white p-4 lg:grid-cols-2">
      <legend className="px-1 font-semibold">{title}</legend>
      <div className="flex flex-col gap-3">
        <p className="text-sm text-ink-muted">{hint}</p>
        <TextField name={`templates.${kind}.subject`} label="Subject" />
        <TextAreaField name={`templates.${kind}.body`} label="Message" rows={9} />
      </div>
      <section
        aria-label={`Preview: ${title}`}
        className="rounded border border-line bg-sand-50 p-3"
      >
        <p className="text-sm font-semibold text-ink-muted">Preview</p>
        <p className="mt-1 font-semibold">
          {renderReminderTemplate(template?.subject ?? '', values)}
        </p>
        <p className="mt-2 whitespace-pre-line text-sm">
          {renderReminderTemplate(template?.body ?? '', values)}
        </p>
      </section>
    </fieldset>
  );
}
