import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { passwordResetCompleteSchema } from '@seamwright/shared';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/form-fields';
import { FormAlert } from '../../../components/ui/form-alert';
import { useServerSubmit } from '../../../lib/form-errors';
import { useCompletePasswordReset } from '../api/password-reset';

export function ResetPasswordForm({ token, onDone }: { token: string; onDone: () => void }) {
  const complete = useCompletePasswordReset(token);
  const { register, handleSubmit, setError, formState } = useForm({
    resolver: zodResolver(passwordResetCompleteSchema),
    mode: 'onChange',
    defaultValues: { password: '' },
  });

  const { submit: onSubmit, formError } = useServerSubmit(
    { handleSubmit, setError },
    ['password'],
    async (values) => {
      await complete.mutateAsync(values);
      onDone();
    },
  );

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
