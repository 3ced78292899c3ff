import { z } from 'zod';
import {
  passwordSchema,
  requiredText,
  roleLabels,
  type InvitationPreview,
} from '@seamwright/shared';
import { Form, SubmitButton, TextField } from '../../../components/ui/form';
import { useAcceptInvitation } from '../api/accept-invitation';

// A new user must give a name; someone with an account only proves their password.
const newUserSchema = z.object({ name: requiredText('Your name', 120), password: passwordSchema });
const existingUserSchema = z.object({
  name: z.string().optional(),
  password: z.string().min(1, 'Password is required'),
});

interface Props {
  token: string;
  preview: InvitationPreview;
  onAccepted: () => void;
}

export function AcceptInvitationForm({ token, preview, onAccepted }: Props) {
  const accept = useAcceptInvitation(token);
  return (
    <div className="flex flex-col gap-4">
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 rounded-md bg-sand-100 p-4">
        <dt className="font-semibold">Company</dt>
        <dd>{preview.companyName}</dd>
        <dt className="font-semibold">E-mail</dt>
        <dd className="break-all">{preview.email}</dd>
        <dt className="font-semibold">Role</dt>
        <dd>{roleLabels[preview.role]}</dd>
      </dl>
      <Form
        schema={preview.hasAccount ? existingUserSchema : newUserSchema}
        defaultValues={{ name: '', password: '' }}
        onSubmit={async (values) => {
          await accept.mutateAsync(
            preview.hasAccount
              ? { password: values.password }
              : { name: values.name ?? '', password: values.password },
          );
          onAccepted();
        }}
      >
        {preview.hasAccount ? (
          <p className="text-ink-muted">
            You already have a Seamwright account. Enter its password to join this company too.
          </p>
        ) : (
          <TextField name="name" label="Your name" autoComplete="name" />
        )}
        <TextField
          name="password"
          label={preview.hasAccount ? 'Your password' : 'Choose a password'}
          type="password"
          autoComplete={preview.hasAccount ? 'current-password' : 'new-password'}
          hint={preview.hasAccount ? undefined : 'At least 10 characters.'}
        />
        <SubmitButton>{`Join ${preview.companyName}`}</SubmitButton>
      </Form>
    </div>
  );
}
