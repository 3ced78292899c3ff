import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { loginInputSchema } from '@seamwright/shared';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/form-fields';
import { FormAlert } from '../../../components/ui/form-alert';
import { useServerSubmit } from '../../../lib/form-errors';
import { useSignIn } from '../api/sign-in';

export function SignInForm({ onSignedIn }: { onSignedIn: () => void }) {
  const signIn = useSignIn();
  const { register, handleSubmit, setError, formState } = useForm({
    resolver: zodResolver(loginInputSchema),
    mode: 'onTouched',
    defaultValues: { email: '', password: '' },
  });
  const { errors } = formState;

  const { submit: onSubmit, formError } = useServerSubmit(
    { handleSubmit, setError },
    ['email', 'password'],
    async (values) => {
      await signIn.mutateAsync(values);
      onSignedIn();
    },
  );

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      <FormAlert>{formError}</FormAlert>
      <TextField
        label="E-mail"
        type="email"
        autoComplete="email"
        error={errors.email?.message}
        {...register('email')}
      />
      <TextField
        label="Password"
        type="password"
        autoComplete="current-password"
        error={errors.password?.message}
        {...register('password')}
      />
      <Button type="submit" isBusy={formState.isSubmitting}>
        {formState.isSubmitting ? 'Signing in…' : 'Sign in'}
      </Button>
    </form>
  );
}
