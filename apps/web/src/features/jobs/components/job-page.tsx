import { Link } from 'react-router-dom';
import type { JobDetailView } from '@seamwright/shared';
import { EmptyState } from '../../../components/ui/empty-state';
import { FormAlert } from '../../../components/ui/form-alert';
import type { ReactNode } from 'react';
import { paths } from '../../../config/paths';
import { formatDate } from '../../../lib/format';
import { useUpdateJob } from '../api/update-job';
import { JobActivity } from './job-activity';
import { JobStatusBadge } from './job-status';
import { JobStatusActions } from './job-status-actions';
import { JobTitleEditor } from './job-title';

function Section({ id, title, children }: { id: string; title: string; children: ReactNode }) {
  return (
    <section aria-labelledby={id} className="flex flex-col gap-3">
      <h2 id={id} className="text-xl font-bold">
        {title}
      </h2>
      {children}
    </section>
  );
}

/** Everything on a job's page below its heading. */
export function JobPage({
  job,
  canWrite,
  timeZone,
  areas,
  turf,
  estimates,
}: {
  job: JobDetailView;
  canWrite: boolean;
  timeZone: string;
  /** The areas section, composed by the route (areas are their own feature). */
  areas?: ReactNode;
  /**
   * The turf held for the job on rolls in stock: a whole section with its own heading,
   * composed by the route (stock is its own feature).
   */
  turf?: ReactNode;
  /** The estimates section, composed by the route (estimates are their own feature). */
  estimates?: ReactNode;
}) {
  const update = useUpdateJob(job.id);
  const site = job.site;
  return (
    <div className="flex max-w-4xl flex-col gap-8">
      <div>
        <JobTitleEditor
          title={job.title}
          canWrite={canWrite}
          onSave={(title) => update.mutateAsync({ title })}
        />
      </div>
      <Section id="job-status" title="Status">
        <p className="flex flex-wrap items-center gap-2">
          <JobStatusBadge status={job.status} />
          <span className="text-ink-muted">· added {formatDate(job.createdAt, timeZone)}</span>
        </p>
        {update.isError ? <FormAlert>{update.error.message}</FormAlert> : null}
        {canWrite ? (
          <JobStatusActions
            status={job.status}
            allowed={job.allowedNextStatuses}
            isBusy={update.isPending}
            onMove={(status) => update.mutateAsync({ status }).catch(() => undefined)}
          />
        ) : null}
      </Section>
      <Section id="job-where" title="Customer and site">
        <dl className="grid gap-3 rounded-lg border border-line bg-white p-4 sm:grid-cols-2">
          <div>
            <dt className="font-semibold">Customer</dt>
            <dd>
              <Link to={paths.customer(job.customer.id)}>{job.customer.name}</Link>
            </dd>
          </div>
          <div>
            <dt className="font-semibold">Site</dt>
            <dd>
              {site.label ? `${site.label}: ` : ''}
              {site.addressLine1}, {site.city}
            </dd>
          </div>
        </dl>
      </Section>
      <Section id="job-areas" title="Areas and plans">
        {areas ?? (
          <EmptyState title="No areas to show">
            Your role does not show the areas and their plans.
          </EmptyState>
        )}
      </Section>
      {/* The turf panel is a section of its own, with its heading. */}
      {turf ?? null}
      <Section id="job-estimates" title="Estimates">
        {estimates ?? (
          <EmptyState title="No estimates to show">
            Your role does not show the estimates and their prices.
          </EmptyState>
        )}
      </Section>
      <Section id="job-documents" title="Documents">
        <EmptyState title="No documents yet">
          Signed estimates, locate tickets, photos and invoices for this job will be kept here.
        </EmptyState>
      </Section>
      <Section id="job-activity" title="Activity">
        <JobActivity events={job.activity} timeZone={timeZone} />
      </Section>
    </div>
  );
}
