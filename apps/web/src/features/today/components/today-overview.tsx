import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { can, type Role } from '@seamwright/shared';
import { CautionPanel } from '../../../components/ui/caution-panel';
import { EmptyState } from '../../../components/ui/empty-state';
import { hourIn } from '../../../lib/format';
import { useDocumentTitle } from '../../../lib/page-title';
import { useSession } from '../../../lib/session';
import { paths } from '../../../config/paths';
import { NextStep } from './next-step';

function greeting(hour: number): string {
  if (hour < 12) return 'Good morning';
  if (hour < 18) return 'Good afternoon';
  return 'Good evening';
}

function officeSteps(role: Role) {
  const steps = [];
  if (can(role, 'customers.write')) {
    steps.push(
      <NextStep key="new" to={paths.newCustomer} title="Add a customer">
        Start a lead with the customer's name and how to reach them, then add the site where the
        turf goes.
      </NextStep>,
    );
  }
  if (can(role, 'customers.read')) {
    steps.push(
      <NextStep key="find" to={paths.customers} title="Find a customer">
        Search by name, e-mail or phone; sites, gate notes and hazards are on each customer's page.
      </NextStep>,
    );
  }
  if (can(role, 'members.manage')) {
    steps.push(
      <NextStep key="team" to={`${paths.settings}#team`} title="Invite your team">
        Bring in the office, your bookkeeper and each crew lead, each with the role that fits their
        work.
      </NextStep>,
    );
  }
  if (can(role, 'company.manage')) {
    steps.push(
      <NextStep key="company" to={paths.settings} title="Check the company details">
        The time zone sets every date you see; the region sets holidays and the locate waiting
        period.
      </NextStep>,
    );
  }
  return steps;
}

/** The first page after sign-in: who, where, and what to do next for this role. */
export function TodayOverview({ nextJobs }: { nextJobs?: ReactNode }) {
  const { user, company, role } = useSession();
  const firstName = user.name.split(' ')[0] ?? user.name;
  useDocumentTitle('Today');

  return (
    <div className="flex max-w-4xl flex-col gap-6">
      <div>
        <h1 tabIndex={-1} className="text-2xl font-bold sm:text-3xl">
          {greeting(hourIn(company.timeZone))}, {firstName}
        </h1>
        <p className="mt-1 text-ink-muted">
          {company.name} ·{' '}
          {new Intl.DateTimeFormat('en-US', {
            timeZone: company.timeZone,
            weekday: 'long',
            month: 'long',
            day: 'numeric',
          }).format(new Date())}
        </p>
      </div>

      {role === 'crew_lead' ? (
        <>
          <EmptyState title="No jobs assigned to your crew yet">
            Booked jobs appear here once the crew calendar lands, with the address, gate notes and
            the day's checklist. Nothing to do until then.
          </EmptyState>
          <CautionPanel title="Before anyone digs: get the lines marked">
            <p>Power, gas, water and data lines can run just under the sod you are about to cut.</p>
            <p>
              Check that a utility-locate request was made through the one-call service (811 in the
              US), that the waiting period has passed, and that the marks are still visible. Dig by
              hand near any mark.
            </p>
          </CautionPanel>
        </>
      ) : (
        <>
          {nextJobs}
          <section aria-labelledby="next-steps">
            <h2 id="next-steps" className="mb-3 text-xl font-bold">
              Next steps
            </h2>
            <ul className="grid gap-3 sm:grid-cols-2">{officeSteps(role)}</ul>
            <p className="mt-4 text-ink-muted">
              The crew calendar and invoices arrive in Seamwright soon. Meanwhile,{' '}
              <Link to={paths.settings}>Settings</Link> shows your profile and role.
            </p>
          </section>
        </>
      )}
    </div>
  );
}
