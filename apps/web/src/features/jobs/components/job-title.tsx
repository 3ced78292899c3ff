import { useState } from 'react';
import { z } from 'zod';
import { jobTitleSchema } from '@seamwright/shared';
import { Button } from '../../../components/ui/button';
import { Form, SubmitButton, TextField } from '../../../components/ui/form';

const titleSchema = z.object({ title: jobTitleSchema });

/** The job's title with an Edit button that turns it into a one-field form. */
export function JobTitleEditor({
  title,
  canWrite,
  onSave,
}: {
  title: string;
  canWrite: boolean;
  onSave: (title: string) => Promise<unknown>;
}) {
  const [isEditing, setEditing] = useState(false);
  if (!canWrite) return null;
  if (!isEditing)
    return (
      <Button variant="secondary" onClick={() => setEditing(true)}>
        Rename
      </Button>
    );
  return (
    <Form
      schema={titleSchema}
      defaultValues={{ title }}
      onSubmit={async (values) => {
        await onSave(values.title);
        setEditing(false);
      }}
      aria-label="Rename the job"
      className="w-full max-w-xl"
    >
      <TextField name="title" label="Job title" autoComplete="off" autoFocus />
      <div className="flex flex-wrap gap-2">
        <SubmitButton>Save title</SubmitButton>
        <Button variant="secondary" onClick={() => setEditing(false)}>
          Cancel
        </Button>
      </div>
    </Form>
  );
}
