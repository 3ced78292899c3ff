import { useState } from 'react';
import { changePasswordInputSchema } from '@seamwright/shared';
import { Form, SubmitButton, TextField } from '../../../components/ui/form';
import { FormNotice } from '../../../components/ui/form-alert';
import { useChangePassword } from '../api/change-password';

/**
 * Change your own password. The current one proves it is you; after the change every other
 * device you were signed in on must sign in again, and this one stays signed in.
 */
export function ChangePasswordForm() {
  const change = useChangePassword();
  const [changed, setChanged] = useState(false);
  return (
    <Form
      schema={changePasswordInputSchema}
      mode="onTouched"
      defaultValues={{ currentPassword: '', newPassword: '' }}
      aria-label="Change your password"
      onSubmit={async (values, form) => {
        setChanged(false);
        await change.mutateAsync(values);
        form.reset();
        setChanged(true);
      }}
    >
      {changed ? (
        <FormNotice>
          Password changed. Any other device you were signed in on has been signed out.
        </FormNotice>
      ) : null}
      <TextField
        name="currentPassword"
        label="Current password"
        type="password"
        autoComplete="current-password"
      />
      <TextField
        name="newPassword"
        label="New password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters. Other devices are signed out when you save."
      />
      <div>
        <SubmitButton busyLabel="Changing password…">Change password</SubmitButton>
      </div>
    </Form>
  );
}
