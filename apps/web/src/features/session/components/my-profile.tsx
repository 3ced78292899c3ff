import { roleLabels } from '@seamwright/shared';
import { useSession } from '../../../lib/session';

/** What anyone can see about themself: name, e-mail and role in the active company. */
export function MyProfile() {
  const { user, role, company } = useSession();
  return (
    <dl className="grid max-w-xl gap-3 rounded-lg border border-line bg-white p-5 sm:grid-cols-[8rem_1fr]">
      <dt className="font-semibold text-ink-muted">Name</dt>
      <dd>{user.name}</dd>
      <dt className="font-semibold text-ink-muted">E-mail</dt>
      <dd className="break-all">{user.email}</dd>
      <dt className="font-semibold text-ink-muted">Role</dt>
      <dd>
        {roleLabels[role]} at {company.name}
      </dd>
    </dl>
  );
}
