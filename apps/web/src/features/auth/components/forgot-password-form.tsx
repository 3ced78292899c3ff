import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { passwordResetRequestSchema } from '@seamwright/shared';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/form-fields';
import { FormAlert, FormNotice } from '../../../components/ui/form-alert';
import { useServerSubmit } from '../../../lib/form-errors';
import { useRequestPasswordReset } from '../api/password-reset';

export function ForgotPasswordForm() {
  const [sentTo, setSentTo] = useState<string | null>(null);
  const request = useRequestPasswordReset();
  const { register, handleSubmit, setError, formState } = useForm({
    resolver: zodResolver(passwordResetRequestSchema),
    mode: 'onTouched',
    defaultValues: { email: '' },
  });

  const { submit: onSubmit, formError } = useServerSubmit(
    { handleSubmit, setError },
    ['email'],
    async (values) => {
      await request.mutateAsync(values);
      setSentTo(values.email);
    },
  );

  if (sentTo) {
    return (
      <FormNotice>
        If <strong>{sentTo}</strong> has a Seamwright account, a link to choose a new password is on
        its way. The link works for a limited time; check your spam folder if it does not arrive.
      </FormNotice>
    );
  }

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      <FormAlert>{formError}</FormAlert>
      <TextField
        label="E-mail"
        type="email"
        autoComplete="email"
        error={formState.errors.email?.message}
        {...register('email')}
      />
      <Button type="submit" isBusy={formState.isSubmitting}>
        Send me a reset link
      </Button>
    </form>
  );
}
