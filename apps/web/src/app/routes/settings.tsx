import { Suspense, type ReactNode } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import { paths } from '../../config/paths';
import { Loading } from '../../components/ui/loading';
import { PageHeader } from '../../components/ui/page-header';
import { RegionErrorBoundary } from '../../components/ui/region-error';
import { queryClient } from '../../lib/query-client';
import { useCan, useSession } from '../../lib/session';
import { companyQueryOptions } from '../../features/company-settings/api/get-company';
import { CompanyForm } from '../../features/company-settings/components/company-form';
import { estimatingSettingsQueryOptions } from '../../features/estimating/api/estimating-settings';
import { EstimatingSettingsPanel } from '../../features/estimating/components/estimating-settings-panel';
import { PriceBookPanel } from '../../features/estimating/components/price-book-panel';
import { reminderSettingsQueryOptions } from '../../features/reminders/api/reminder-settings';
import { ReminderSettingsPanel } from '../../features/reminders/components/reminder-settings-panel';
import { meQueryOptions } from '../../features/session/api/get-me';
import { MyProfile } from '../../features/session/components/my-profile';
import { invitationsQueryOptions } from '../../features/team/api/get-invitations';
import { membersQueryOptions } from '../../features/team/api/get-members';
import { InviteForm } from '../../features/team/components/invite-form';
import { MembersList } from '../../features/team/components/members-list';
import { PendingInvitations } from '../../features/team/components/pending-invitations';
import { RouteError } from './route-error';
import { sessionCan } from './guard';

export async function loader() {
  if (await sessionCan('company.manage')) void queryClient.prefetchQuery(companyQueryOptions());
  if (await sessionCan('members.read')) {
    await Promise.all([
      queryClient.ensureInfiniteQueryData(membersQueryOptions()),
      queryClient.ensureQueryData(invitationsQueryOptions()),
    ]);
  }
  if (await sessionCan('pricebook.read'))
    void queryClient.prefetchQuery(estimatingSettingsQueryOptions());
  if (await sessionCan('reminders.manage'))
    void queryClient.prefetchQuery(reminderSettingsQueryOptions());
  return null;
}

function Section({ id, title, children }: { id: string; title: string; children: ReactNode }) {
  return (
    <section id={id} aria-labelledby={`${id}-heading`} className="scroll-mt-6">
      <h2 id={`${id}-heading`} className="mb-3 text-xl font-bold">
        {title}
      </h2>
      <RegionErrorBoundary>
        <Suspense fallback={<Loading />}>{children}</Suspense>
      </RegionErrorBoundary>
    </section>
  );
}

export function Component() {
  const { company } = useSession();
  const client = useQueryClient();
  const canManageCompany = useCan('company.manage');
  const canManageTeam = useCan('members.manage');
  const canReadPrices = useCan('pricebook.read');
  const canWritePrices = useCan('pricebook.write');
  const canManageEstimating = useCan('estimating.manage');
  const canManageReminders = useCan('reminders.manage');
  const canManageCrews = useCan('crews.manage');
  return (
    <div className="flex max-w-4xl flex-col gap-10">
      <PageHeader
        title="Settings"
        subtitle={
          canManageCompany
            ? `${company.name}: company, team and your profile.`
            : 'Your profile and role.'
        }
      />
      <Section id="profile" title="Your profile">
        <MyProfile showEditLink />
      </Section>
      {canManageCrews ? (
        <section aria-labelledby="crews-heading">
          <h2 id="crews-heading" className="mb-3 text-xl font-bold">
            Crews
          </h2>
          <p>
            <Link to={paths.crews}>Crews, their colours, working days and people</Link>
          </p>
        </section>
      ) : null}
      {canManageCompany ? (
        <Section id="company" title="Company details">
          <div className="rounded-lg border border-line bg-white p-6">
            <CompanyForm
              onSaved={() => client.invalidateQueries({ queryKey: meQueryOptions().queryKey })}
            />
          </div>
        </Section>
      ) : null}
      {canReadPrices ? (
        <>
          <Section id="estimating" title="Estimating">
            <EstimatingSettingsPanel canManage={canManageEstimating} />
          </Section>
          <Section id="price-book" title="Price book">
            <PriceBookPanel currency={company.currency} canWrite={canWritePrices} />
          </Section>
        </>
      ) : null}
      {canManageReminders ? (
        <Section id="reminders" title="Payment reminders">
          <ReminderSettingsPanel companyName={company.name} />
        </Section>
      ) : null}
      {canManageTeam ? (
        <>
          <Section id="team" title="Team">
            <MembersList />
          </Section>
          <Section id="invite" title="Invite someone">
            <div className="rounded-lg border border-line bg-white p-6">
              <InviteForm />
            </div>
          </Section>
          <Section id="invitations" title="Invitations waiting">
            <PendingInvitations />
          </Section>
        </>
      ) : null}
    </div>
  );
}

export const ErrorBoundary = RouteError;
