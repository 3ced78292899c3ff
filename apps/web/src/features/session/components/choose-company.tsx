import { useNavigate } from 'react-router-dom';
import { roleLabels } from '@seamwright/shared';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { Loading } from '../../../components/ui/loading';
import { describeError } from '../../../components/ui/region-error';
import { paths } from '../../../config/paths';
import { useMyCompanies } from '../api/get-my-companies';
import { useSignOut } from '../api/sign-out';
import { useSwitchCompany } from '../api/switch-company';

/** The companies the person still belongs to, one button each, and the way out. */
export function ChooseCompany() {
  const navigate = useNavigate();
  const companies = useMyCompanies();
  const switchCompany = useSwitchCompany(() => void navigate(paths.today, { replace: true }));
  const signOut = useSignOut(() => void navigate(paths.signIn(), { replace: true }));

  if (companies.isPending) return <Loading label="Loading your companies…" />;
  return (
    <div className="flex flex-col gap-4">
      {companies.isError ? <FormAlert>{describeError(companies.error).detail}</FormAlert> : null}
      {switchCompany.isError ? (
        <FormAlert>{describeError(switchCompany.error).detail}</FormAlert>
      ) : null}
      {companies.data?.length ? (
        <ul className="flex flex-col gap-2" aria-label="Your companies">
          {companies.data.map((membership) => (
            <li key={membership.companyId}>
              <button
                type="button"
                disabled={switchCompany.isPending}
                onClick={() => switchCompany.mutate({ companyId: membership.companyId })}
                className="min-h-11 w-full rounded-md border border-line-strong bg-white px-4 py-2 text-left hover:bg-sand-100 disabled:opacity-60"
              >
                <span className="block font-semibold">{membership.companyName}</span>
                <span className="block text-sm text-ink-muted">{roleLabels[membership.role]}</span>
              </button>
            </li>
          ))}
        </ul>
      ) : null}
      <Button variant="secondary" isBusy={signOut.isPending} onClick={() => signOut.mutate()}>
        Sign out
      </Button>
    </div>
  );
}
