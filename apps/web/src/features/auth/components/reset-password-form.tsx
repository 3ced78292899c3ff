import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { passwordResetCompleteSchema } from '@seamwright/shared';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/form-fields';
import { FormAlert } from '../../../components/ui/form-alert';
import { applyServerErrors } from '../../../lib/form-errors';
import { useCompletePasswordReset } from '../api/password-reset';

export function ResetPasswordForm({ token, onDone }: { token: string; onDone: () => void }) {
  const [formError, setFormError] = useState<string | null>(null);
  const complete = useCompletePasswordReset(token);
  const { register, handleSubmit, setError, formState } = useForm({
    resolver: zodResolver(passwordResetCompleteSchema),
    mode: 'onChange',
    defaultValues: { password: '' },
  });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      await complete.mutateAsync(values);
      onDone();
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ['password']));
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      <FormAlert>{formError}</FormAlert>
      <TextField
        label="New password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters."
        error={formState.errors.password?.message}
        {...register('password')}
      />
      <Button type="submit" isBusy={formState.isSubmitting}>
        Save new password
      </Button>
    </form>
  );
}
