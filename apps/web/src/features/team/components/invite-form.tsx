import { useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { createInvitationInputSchema, roleLabels, roles } from '@seamwright/shared';
import { Button } from '../../../components/ui/button';
import { SelectField, TextField } from '../../../components/ui/form-fields';
import { FormAlert, FormNotice } from '../../../components/ui/form-alert';
import { useServerSubmit } from '../../../lib/form-errors';
import { useCreateInvitation } from '../api/create-invitation';

export const roleHints: Record<(typeof roles)[number], string> = {
  owner: 'Everything, including settings and the team.',
  office: 'Customers, sites, estimates and the crew calendar.',
  bookkeeper: 'Invoices and payments; reads jobs and customers.',
  crew_lead: 'Their crew’s jobs on a phone. Never sees prices or billing.',
};

export function InviteForm() {
  const [sentTo, setSentTo] = useState<string | null>(null);
  const invite = useCreateInvitation();
  const { register, handleSubmit, setError, formState, reset, control } = useForm({
    resolver: zodResolver(createInvitationInputSchema),
    mode: 'onTouched',
    defaultValues: { email: '', role: 'office' as const },
  });
  const role = useWatch({ control, name: 'role' });

  const { submit, formError } = useServerSubmit(
    { handleSubmit, setError },
    ['email', 'role'],
    async (values) => {
      setSentTo(null);
      await invite.mutateAsync(values);
      setSentTo(values.email);
      reset({ email: '', role: values.role });
    },
  );

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4" aria-label="Invite someone">
      <FormAlert>{formError}</FormAlert>
      {sentTo ? <FormNotice>Invitation sent to {sentTo}.</FormNotice> : null}
      <div className="grid items-start gap-4 sm:grid-cols-[2fr_1fr]">
        <TextField
          label="E-mail"
          type="email"
          autoComplete="off"
          error={formState.errors.email?.message}
          {...register('email')}
        />
        <SelectField
          label="Role"
          hint={roleHints[role]}
          error={formState.errors.role?.message}
          {...register('role')}
        >
          {roles.map((r) => (
            <option key={r} value={r}>
              {roleLabels[r]}
            </option>
          ))}
        </SelectField>
      </div>
      <div>
        <Button type="submit" isBusy={formState.isSubmitting}>
          Send invitation
        </Button>
      </div>
    </form>
  );
}
