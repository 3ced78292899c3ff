import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { signupInputSchema } from '@seamwright/shared';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/form-fields';
import { FormAlert } from '../../../components/ui/form-alert';
import { useServerSubmit } from '../../../lib/form-errors';
import { useSignUp } from '../api/sign-up';

export function SignUpForm({ onSignedUp }: { onSignedUp: () => void }) {
  const signUp = useSignUp();
  const { register, handleSubmit, setError, formState } = useForm({
    resolver: zodResolver(signupInputSchema),
    mode: 'onChange',
    defaultValues: { companyName: '', name: '', email: '', password: '' },
  });
  const { errors } = formState;

  const { submit: onSubmit, formError } = useServerSubmit(
    { handleSubmit, setError },
    ['companyName', 'name', 'email', 'password'],
    async (values) => {
      await signUp.mutateAsync(values);
      onSignedUp();
    },
  );

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      <FormAlert>{formError}</FormAlert>
      <TextField
        label="Company name"
        autoComplete="organization"
        error={errors.companyName?.message}
        {...register('companyName')}
      />
      <TextField
        label="Your name"
        autoComplete="name"
        error={errors.name?.message}
        {...register('name')}
      />
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
        autoComplete="new-password"
        hint="At least 10 characters. A short sentence is easy to remember."
        error={errors.password?.message}
        {...register('password')}
      />
      <Button type="submit" isBusy={formState.isSubmitting}>
        {formState.isSubmitting ? 'Setting up your company…' : 'Create company'}
      </Button>
    </form>
  );
}
