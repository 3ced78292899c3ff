import { useNavigate, useRevalidator } from 'react-router-dom';
import { roleLabels } from '@seamwright/shared';
import { describeError } from '../../../components/ui/region-error';
import { paths } from '../../../config/paths';
import { useSession } from '../../../lib/session';
import { useSwitchCompany } from '../api/switch-company';

/** The active company, and the others this person belongs to. */
export function CompanySwitcher({ tone = 'dark' }: { tone?: 'dark' | 'light' }) {
  const me = useSession();
  const navigate = useNavigate();
  const revalidator = useRevalidator();
  const switchCompany = useSwitchCompany(() => {
    void navigate(paths.today);
    void revalidator.revalidate();
  });
  const others = me.companies.filter((m) => m.companyId !== me.company.id);
  const muted = tone === 'dark' ? 'text-sand-200' : 'text-ink-muted';

  return (
    <div>
      <p className={`text-xs font-semibold tracking-wide uppercase ${muted}`}>Company</p>
      <p className="text-lg leading-tight font-bold">{me.company.name}</p>
      <p className={`text-sm ${muted}`}>{roleLabels[me.role]}</p>
      {others.length > 0 ? (
        // Keyed by company so the list closes once the switch is done.
        <details key={me.company.id} className="mt-2">
          <summary
            className={`min-h-11 cursor-pointer py-2 font-semibold underline ${tone === 'dark' ? 'text-sand-100' : 'text-moss-800'}`}
          >
            Switch company
          </summary>
          <ul className="mt-1 flex flex-col gap-1">
            {others.map((membership) => (
              <li key={membership.companyId}>
                <button
                  type="button"
                  disabled={switchCompany.isPending}
                  onClick={() => switchCompany.mutate({ companyId: membership.companyId })}
                  className={`min-h-11 w-full rounded px-2 text-left ${tone === 'dark' ? 'bg-moss-800 hover:bg-moss-700' : 'bg-sand-100 hover:bg-sand-200'}`}
                >
                  {membership.companyName}
                  <span className={`block text-sm ${muted}`}>{roleLabels[membership.role]}</span>
                </button>
              </li>
            ))}
          </ul>
          {switchCompany.isError ? (
            <p role="alert">{describeError(switchCompany.error).detail}</p>
          ) : null}
        </details>
      ) : null}
    </div>
  );
}
