import { Link } from 'react-router-dom';
import type { JobStatus, Role } from '@seamwright/shared';
import { paths } from '../../../config/paths';
import { Loading } from '../../../components/ui/loading';
import { useJobs } from '../api/get-jobs';
import { jobListParamsSchema } from '../utils/list-params';
import { toJobSearchParams } from '../utils/list-params';
import { JobStatusBadge } from './job-status';

/** Which jobs come next for each role; crew leads get theirs through bookings later. */
const nextFor: Partial<Record<Role, { statuses: JobStatus[]; title: string; empty: string }>> = {
  owner: {
    statuses: ['lead', 'estimated'],
    title: 'Leads and estimates to follow up',
    empty: 'No open leads or estimates. New jobs start as leads from a customer’s page.',
  },
  office: {
    statuses: ['lead', 'estimated'],
    title: 'Leads and estimates to follow up',
    empty: 'No open leads or estimates. New jobs start as leads from a customer’s page.',
  },
  bookkeeper: {
    statuses: ['accepted', 'installed'],
    title: 'Jobs to bill',
    empty: 'No accepted or installed jobs waiting for a deposit or a final invoice.',
  },
};

/** The signed-in role's next jobs on Today, newest first. */
export function NextJobs({ role }: { role: Role }) {
  const plan = nextFor[role];
  const params = jobListParamsSchema.parse({
    status: plan?.statuses ?? [],
    pageSize: 10,
    sort: '-createdAt',
  });
  const query = useJobs(params);
  if (!plan)
    return (
      <p className="text-ink-muted">
        Booked jobs appear here once the crew calendar lands, with the address, gate notes and the
        day&apos;s checklist.
      </p>
    );
  return (
    <section aria-labelledby="next-jobs">
      <h2 id="next-jobs" className="mb-3 text-xl font-bold">
        {plan.title}
      </h2>
      {query.isPending ? (
        <Loading label="Loading jobs…" />
      ) : query.isError ? (
        <p className="text-ink-muted">
          The jobs could not be loaded; reload the page to try again.
        </p>
      ) : query.data.data.length === 0 ? (
        <p className="text-ink-muted">{plan.empty}</p>
      ) : (
        <>
          <ul className="flex flex-col gap-2">
            {query.data.data.map((job) => (
              <li
                key={job.id}
                className="flex flex-wrap items-center justify-between gap-2 rounded-md border border-line bg-white px-4 py-3"
              >
                <span className="flex flex-col">
                  <Link to={paths.job(job.id)} className="font-semibold">
                    {job.title}
                  </Link>
                  <span className="text-sm text-ink-muted">
                    {job.customer.name} · {job.site.addressLine1}, {job.site.city}
                  </span>
                </span>
                <JobStatusBadge status={job.status} />
              </li>
            ))}
          </ul>
          {query.data.meta.total > query.data.data.length ? (
            <p className="mt-2">
              <Link to={`${paths.jobs}?${toJobSearchParams(params).toString()}`}>
                All {query.data.meta.total} of them
              </Link>
            </p>
          ) : null}
        </>
      )}
    </section>
  );
}
