import { useCallback, useMemo } from 'react';
import { Link, useSearchParams } from 'react-router-dom';
import { DataTable } from '../../../components/ui/data-table';
import { EmptyState } from '../../../components/ui/empty-state';
import { ErrorPanel } from '../../../components/ui/region-error';
import { Loading } from '../../../components/ui/loading';
import { buttonClasses } from '../../../components/ui/button';
import { paths } from '../../../config/paths';
import { useCan, useSession } from '../../../lib/session';
import { useJobs } from '../api/get-jobs';
import {
  isFiltered,
  jobPageSizes,
  joinSort,
  parseJobListParams,
  splitSort,
  toJobSearchParams,
  type JobListParams,
} from '../utils/list-params';
import { jobColumns } from './job-columns';
import { JobFilters } from './job-filters';

/** The jobs list; every bit of its state is in the URL, so it survives a reload. */
export function JobsList() {
  const [searchParams, setSearchParams] = useSearchParams();
  const params = useMemo(() => parseJobListParams(searchParams), [searchParams]);
  const { company } = useSession();
  const canWrite = useCan('jobs.write');
  const columns = useMemo(() => jobColumns(company.timeZone), [company.timeZone]);
  const query = useJobs(params);

  const update = useCallback(
    (change: Partial<JobListParams>) => {
      // Any change other than the page itself starts again at page 1.
      const next = { ...params, page: 1, ...change };
      setSearchParams(toJobSearchParams(next), {
        replace: !('page' in change) && 'q' in change,
      });
    },
    [params, setSearchParams],
  );

  const filters = <JobFilters params={params} onChange={update} />;
  if (query.isPending)
    return (
      <>
        {filters}
        <Loading label="Loading jobs…" />
      </>
    );
  if (query.isError)
    return (
      <>
        {filters}
        <ErrorPanel error={query.error} onRetry={() => void query.refetch()} />
      </>
    );

  const { data, meta } = query.data;
  if (meta.total === 0)
    return (
      <>
        {filters}
        {isFiltered(params) ? (
          <EmptyState title="No jobs match">
            Try another search, more statuses or a wider date range.
          </EmptyState>
        ) : (
          <EmptyState
            title="No jobs yet"
            action={
              canWrite ? (
                <Link to={paths.newJob()} className={buttonClasses('primary')}>
                  Start a job
                </Link>
              ) : null
            }
          >
            A job starts as a lead for one of a customer&apos;s sites; estimates, crews and invoices
            follow from it.
          </EmptyState>
        )}
      </>
    );

  return (
    <>
      {filters}
      <DataTable
        caption="Jobs"
        columns={columns}
        data={data}
        total={meta.total}
        page={params.page}
        pageSize={params.pageSize}
        pageSizeOptions={jobPageSizes}
        sort={splitSort(params.sort)}
        isFetching={query.isPlaceholderData}
        onSortChange={(sort) => update({ sort: joinSort(sort.field, sort.direction) })}
        onPageChange={(page) => update({ page })}
        onPageSizeChange={(pageSize) =>
          update({ pageSize: jobPageSizes.find((s) => s === pageSize) ?? 25 })
        }
      />
    </>
  );
}
