import { useState } from 'react';
import { updateProfileInputSchema } from '@seamwright/shared';
import { Form, SubmitButton, TextField } from '../../../components/ui/form';
import { FormNotice } from '../../../components/ui/form-alert';
import { useSession } from '../../../lib/session';
import { useUpdateProfile } from '../api/update-profile';

/** Your name as the team sees it on jobs, the calendar and the history. */
export function ProfileNameForm() {
  const { user } = useSession();
  const update = useUpdateProfile();
  const [saved, setSaved] = useState(false);
  return (
    <Form
      schema={updateProfileInputSchema}
      defaultValues={{ name: user.name }}
      aria-label="Your name"
      onSubmit={async (values, form) => {
        setSaved(false);
        const me = await update.mutateAsync(values);
        form.reset({ name: me.user.name });
        setSaved(true);
      }}
    >
      {saved ? <FormNotice>Your name is saved.</FormNotice> : null}
      <TextField
        name="name"
        label="Your name"
        autoComplete="name"
        hint="As the team sees it on jobs, the calendar and the history."
      />
      <div>
        <SubmitButton>Save name</SubmitButton>
      </div>
    </Form>
  );
}
