import { useState } from 'react';
import { useWatch } from 'react-hook-form';
import { createInvitationInputSchema, roleLabels, roles, type Role } from '@seamwright/shared';
import { Form, SelectField, SubmitButton, TextField } from '../../../components/ui/form';
import { FormNotice } from '../../../components/ui/form-alert';
import { useCreateInvitation } from '../api/create-invitation';

export const roleHints: Record<(typeof roles)[number], string> = {
  owner: 'Everything, including settings and the team.',
  office: 'Customers, sites, estimates and the crew calendar.',
  bookkeeper: 'Invoices and payments; reads jobs and customers.',
  crew_lead: 'Their crew’s jobs on a phone. Never sees prices or billing.',
};

/** The role picker, whose hint says what the chosen role may do. */
function RoleField() {
  // The select offers exactly the roles, so its value is one of them.
  const role = useWatch({ name: 'role' }) as Role;
  return (
    <SelectField name="role" label="Role" hint={roleHints[role]}>
      {roles.map((r) => (
        <option key={r} value={r}>
          {roleLabels[r]}
        </option>
      ))}
    </SelectField>
  );
}

export function InviteForm() {
  const [sentTo, setSentTo] = useState<string | null>(null);
  const invite = useCreateInvitation();
  return (
    <Form
      schema={createInvitationInputSchema}
      mode="onTouched"
      defaultValues={{ email: '', role: 'office' }}
      aria-label="Invite someone"
      onSubmit={async (values, form) => {
        setSentTo(null);
        await invite.mutateAsync(values);
        setSentTo(values.email);
        form.reset({ email: '', role: values.role });
      }}
    >
      {sentTo ? <FormNotice>Invitation sent to {sentTo}.</FormNotice> : null}
      <div className="grid items-start gap-4 sm:grid-cols-[2fr_1fr]">
        <TextField name="email" label="E-mail" type="email" autoComplete="off" />
        <RoleField />
      </div>
      <div>
        <SubmitButton>Send invitation</SubmitButton>
      </div>
    </Form>
  );
}
