import { loginInputSchema } from '@seamwright/shared';
import { Form, SubmitButton, TextField } from '../../../components/ui/form';
import { useSignIn } from '../api/sign-in';

export function SignInForm({ onSignedIn }: { onSignedIn: () => void }) {
  const signIn = useSignIn();
  return (
    <Form
      schema={loginInputSchema}
      mode="onTouched"
      defaultValues={{ email: '', password: '' }}
      onSubmit={async (values) => {
        await signIn.mutateAsync(values);
        onSignedIn();
      }}
    >
      <TextField name="email" label="E-mail" type="email" autoComplete="email" />
      <TextField name="password" label="Password" type="password" autoComplete="current-password" />
      <SubmitButton busyLabel="Signing in…">Sign in</SubmitButton>
    </Form>
  );
}
