import { signupInputSchema } from '@seamwright/shared';
import { Form, SubmitButton, TextField } from '../../../components/ui/form';
import { useSignUp } from '../api/sign-up';

export function SignUpForm({ onSignedUp }: { onSignedUp: () => void }) {
  const signUp = useSignUp();
  return (
    <Form
      schema={signupInputSchema}
      defaultValues={{ companyName: '', name: '', email: '', password: '' }}
      onSubmit={async (values) => {
        await signUp.mutateAsync(values);
        onSignedUp();
      }}
    >
      <TextField name="companyName" label="Company name" autoComplete="organization" />
      <TextField name="name" label="Your name" autoComplete="name" />
      <TextField name="email" label="E-mail" type="email" autoComplete="email" />
      <TextField
        name="password"
        label="Password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters. A short sentence is easy to remember."
      />
      <SubmitButton busyLabel="Setting up your company…">Create company</SubmitButton>
    </Form>
  );
}
