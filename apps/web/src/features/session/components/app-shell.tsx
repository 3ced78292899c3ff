import type { ReactNode } from 'react';
import { NavLink } from 'react-router-dom';
import { TurfMark } from '../../../components/ui/icons';
import { NavigationProgress } from '../../../components/ui/navigation-progress';
import { cn } from '../../../components/ui/cn';
import { paths } from '../../../config/paths';
import { useSession } from '../../../lib/session';
import { phoneSectionsFor, sectionsFor } from '../utils/sections';
import { CompanySwitcher } from './company-switcher';
import { UserMenu } from './user-menu';

/**
 * The signed-in frame. Desktop: a slim rail (company, sections, account). Phone: a top line
 * with the company and account, and a bottom bar with the role's sections.
 */
export function AppShell({ children }: { children: ReactNode }) {
  const { role } = useSession();
  const sections = sectionsFor(role);
  const phoneSections = phoneSectionsFor(role);

  return (
    <div className="min-h-dvh md:flex">
      <NavigationProgress />
      <a
        href="#main"
        className="sr-only focus:not-sr-only focus:absolute focus:z-50 focus:m-2 focus:rounded focus:bg-white focus:p-3"
      >
        Skip to content
      </a>

      <aside
        data-surface="dark"
        className="sticky top-0 hidden h-dvh w-60 shrink-0 flex-col gap-6 bg-moss-900 p-4 text-sand-100 md:flex print:hidden"
      >
        <NavLink
          to={paths.today}
          className="flex items-center gap-2 text-lg font-bold text-sand-100 no-underline"
        >
          <TurfMark className="h-7 w-7 text-sand-200" />
          Seamwright
        </NavLink>
        <CompanySwitcher />
        <nav aria-label="Sections" className="flex-1">
          <ul className="flex flex-col gap-1">
            {sections.map(({ to, label, Icon }) => (
              <li key={to}>
                <NavLink
                  to={to}
                  end={to === paths.today}
                  className={({ isActive }) =>
                    cn(
                      'flex min-h-11 items-center gap-3 rounded-md px-3 font-semibold no-underline',
                      isActive ? 'bg-sand-100 text-moss-900' : 'text-sand-100 hover:bg-moss-800',
                    )
                  }
                >
                  <Icon />
                  {label}
                </NavLink>
              </li>
            ))}
          </ul>
        </nav>
        <UserMenu />
      </aside>

      <header className="flex items-start justify-between gap-3 border-b border-line bg-white px-4 py-3 md:hidden print:hidden">
        <CompanySwitcher tone="light" />
        <UserMenu tone="light" />
      </header>

      <main
        id="main"
        tabIndex={-1}
        className="min-w-0 flex-1 px-4 pt-6 pb-28 md:px-10 md:py-8 print:p-0"
      >
        {children}
      </main>

      <nav
        aria-label="Sections"
        className="fixed inset-x-0 bottom-0 z-30 border-t border-line bg-white md:hidden print:hidden"
      >
        <ul className="flex">
          {phoneSections.map(({ to, label, Icon }) => (
            <li key={to} className="flex-1">
              <NavLink
                to={to}
                end={to === paths.today}
                className={({ isActive }) =>
                  cn(
                    'flex min-h-16 flex-col items-center justify-center gap-1 text-sm font-semibold no-underline',
                    isActive ? 'bg-moss-50 text-moss-800' : 'text-ink-muted',
                  )
                }
              >
                <Icon />
                {label}
              </NavLink>
            </li>
          ))}
        </ul>
      </nav>
    </div>
  );
}
