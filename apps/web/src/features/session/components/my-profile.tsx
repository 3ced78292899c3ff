import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { roleLabels } from '@seamwright/shared';
import { paths } from '../../../config/paths';
import { useSession } from '../../../lib/session';
import { ChangePasswordForm } from './change-password-form';
import { ProfileNameForm } from './profile-name-form';

/** What anyone can see about themself: name, e-mail and role in the active company. */
export function MyProfile({ showEditLink = false }: { showEditLink?: boolean }) {
  const { user, role, company } = useSession();
  return (
    <div className="flex max-w-xl flex-col gap-3 rounded-lg border border-line bg-white p-5">
      <dl className="grid gap-3 sm:grid-cols-[8rem_1fr]">
        <dt className="font-semibold text-ink-muted">Name</dt>
        <dd>{user.name}</dd>
        <dt className="font-semibold text-ink-muted">E-mail</dt>
        <dd className="break-all">{user.email}</dd>
        <dt className="font-semibold text-ink-muted">Role</dt>
        <dd>
          {roleLabels[role]} at {company.name}
        </dd>
      </dl>
      {showEditLink ? (
        <p>
          <Link to={paths.profile} className="font-semibold text-moss-800 underline">
            Change your name or password
          </Link>
        </p>
      ) : null}
    </div>
  );
}

function Panel({ id, title, children }: { id: string; title: string; children: ReactNode }) {
  return (
    <section aria-labelledby={id} className="flex flex-col gap-3">
      <h2 id={id} className="text-xl font-bold">
        {title}
      </h2>
      <div className="max-w-xl rounded-lg border border-line bg-white p-5">{children}</div>
    </section>
  );
}

/** The profile page: who you are, and the forms to change your name and password. */
export function MyProfilePage() {
  return (
    <div className="flex flex-col gap-8">
      <MyProfile />
      <Panel id="profile-name-heading" title="Name">
        <ProfileNameForm />
      </Panel>
      <Panel id="profile-password-heading" title="Password">
        <ChangePasswordForm />
      </Panel>
    </div>
  );
}
