import { passwordResetCompleteSchema } from '@seamwright/shared';
import { Form, SubmitButton, TextField } from '../../../components/ui/form';
import { useCompletePasswordReset } from '../api/password-reset';

export function ResetPasswordForm({ token, onDone }: { token: string; onDone: () => void }) {
  const complete = useCompletePasswordReset(token);
  return (
    <Form
      schema={passwordResetCompleteSchema}
      defaultValues={{ password: '' }}
      onSubmit={async (values) => {
        await complete.mutateAsync(values);
        onDone();
      }}
    >
      <TextField
        name="password"
        label="New password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters."
      />
      <SubmitButton>Save new password</SubmitButton>
    </Form>
  );
}
