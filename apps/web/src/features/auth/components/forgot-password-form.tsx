import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { passwordResetRequestSchema } from '@seamwright/shared';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/form-fields';
import { FormAlert, FormNotice } from '../../../components/ui/form-alert';
import { applyServerErrors } from '../../../lib/form-errors';
import { useRequestPasswordReset } from '../api/password-reset';

export function ForgotPasswordForm() {
  const [formError, setFormError] = useState<string | null>(null);
  const [sentTo, setSentTo] = useState<string | null>(null);
  const request = useRequestPasswordReset();
  const { register, handleSubmit, setError, formState } = useForm({
    resolver: zodResolver(passwordResetRequestSchema),
    mode: 'onTouched',
    defaultValues: { email: '' },
  });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      await request.mutateAsync(values);
      setSentTo(values.email);
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ['email']));
    }
  });

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
