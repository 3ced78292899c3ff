import { useState } from 'react';
import { passwordResetRequestSchema } from '@seamwright/shared';
import { Form, SubmitButton, TextField } from '../../../components/ui/form';
import { FormNotice } from '../../../components/ui/form-alert';
import { useRequestPasswordReset } from '../api/password-reset';

export function ForgotPasswordForm() {
  const [sentTo, setSentTo] = useState<string | null>(null);
  const request = useRequestPasswordReset();

  if (sentTo) {
    return (
      <FormNotice>
        If <strong>{sentTo}</strong> has a Seamwright account, a link to choose a new password is on
        its way. The link works for a limited time; check your spam folder if it does not arrive.
      </FormNotice>
    );
  }

  return (
    <Form
      schema={passwordResetRequestSchema}
      mode="onTouched"
      defaultValues={{ email: '' }}
      onSubmit={async (values) => {
        await request.mutateAsync(values);
        setSentTo(values.email);
      }}
    >
      <TextField name="email" label="E-mail" type="email" autoComplete="email" />
      <SubmitButton>Send me a reset link</SubmitButton>
    </Form>
  );
}
