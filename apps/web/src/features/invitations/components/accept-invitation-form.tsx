import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import {
  passwordSchema,
  requiredText,
  roleLabels,
  type InvitationPreview,
} from '@seamwright/shared';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/form-fields';
import { FormAlert } from '../../../components/ui/form-alert';
import { useServerSubmit } from '../../../lib/form-errors';
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
  const { register, handleSubmit, setError, formState } = useForm({
    resolver: zodResolver(preview.hasAccount ? existingUserSchema : newUserSchema),
    mode: 'onChange',
    defaultValues: { name: '', password: '' },
  });
  const { errors } = formState;

  const { submit: onSubmit, formError } = useServerSubmit(
    { handleSubmit, setError },
    ['name', 'password'],
    async (values) => {
      await accept.mutateAsync(
        preview.hasAccount
          ? { password: values.password }
          : { name: values.name, password: values.password },
      );
      onAccepted();
    },
  );

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 rounded-md bg-sand-100 p-4">
        <dt className="font-semibold">Company</dt>
        <dd>{preview.companyName}</dd>
        <dt className="font-semibold">E-mail</dt>
        <dd className="break-all">{preview.email}</dd>
        <dt className="font-semibold">Role</dt>
        <dd>{roleLabels[preview.role]}</dd>
      </dl>
      <FormAlert>{formError}</FormAlert>
      {preview.hasAccount ? (
        <p className="text-ink-muted">
          You already have a Seamwright account. Enter its password to join this company too.
        </p>
      ) : (
        <TextField
          label="Your name"
          autoComplete="name"
          error={errors.name?.message}
          {...register('name')}
        />
      )}
      <TextField
        label={preview.hasAccount ? 'Your password' : 'Choose a password'}
        type="password"
        autoComplete={preview.hasAccount ? 'current-password' : 'new-password'}
        hint={preview.hasAccount ? undefined : 'At least 10 characters.'}
        error={errors.password?.message}
        {...register('password')}
      />
      <Button type="submit" isBusy={formState.isSubmitting}>
        Join {preview.companyName}
      </Button>
    </form>
  );
}
