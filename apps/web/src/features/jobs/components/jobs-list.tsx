import { useMemo } from 'react';
import { Link } from 'react-router-dom';
import { DataTable } from '../../../components/ui/data-table';
import { EmptyState } from '../../../components/ui/empty-state';
import { listQueryFrame } from '../../../components/ui/list-query-frame';
import { buttonClasses } from '../../../components/ui/button';
import { paths } from '../../../config/paths';
import { useCan, useSession } from '../../../lib/session';
import { useUrlListParams } from '../../../lib/use-url-list-params';
import { useJobs } from '../api/get-jobs';
import {
  isFiltered,
  jobPageSizes,
  joinSort,
  parseJobListParams,
  splitSort,
  toJobSearchParams,
} from '../utils/list-params';
import { jobColumns } from './job-columns';
import { JobFilters } from './job-filters';

/** The jobs list; every bit of its state is in the URL, so it survives a reload. */
export function JobsList() {
  const { params, update } = useUrlListParams(parseJobListParams, toJobSearchParams, 'q');
  const { company } = useSession();
  const canWrite = useCan('jobs.write');
  const columns = useMemo(() => jobColumns(company.timeZone), [company.timeZone]);
  const query = useJobs(params);

  const filters = <JobFilters params={params} onChange={update} />;
  const pending = listQueryFrame(query, filters, 'Loading jobs…');
  if (pending || !query.data) return pending;

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
