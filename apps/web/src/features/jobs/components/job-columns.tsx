import { createColumnHelper } from '@tanstack/react-table';
import { Link } from 'react-router-dom';
import type { JobView } from '@seamwright/shared';
import { paths } from '../../../config/paths';
import { formatDate } from '../../../lib/format';
import { JobStatusBadge } from './job-status';

const column = createColumnHelper<JobView>();

/** Columns of the jobs list; title, status and created are sorted by the server. */
export function jobColumns(timeZone: string) {
  return [
    column.accessor('title', {
      id: 'title',
      header: 'Job',
      cell: (info) => (
        <Link
          to={paths.job(info.row.original.id)}
          className="font-semibold underline-offset-2 hover:underline"
        >
          {info.getValue()}
        </Link>
      ),
    }),
    column.accessor('status', {
      id: 'status',
      header: 'Status',
      cell: (info) => <JobStatusBadge status={info.getValue()} />,
    }),
    column.accessor((job) => job.customer.name, {
      id: 'customer',
      header: 'Customer',
      enableSorting: false,
    }),
    column.accessor((job) => `${job.site.addressLine1}, ${job.site.city}`, {
      id: 'site',
      header: 'Site',
      enableSorting: false,
      meta: { isHiddenOnPhone: true },
    }),
    column.accessor('createdAt', {
      id: 'createdAt',
      header: 'Added',
      meta: { isNumeric: true, isHiddenOnPhone: true },
      cell: (info) => (
        <span className="whitespace-nowrap">{formatDate(info.getValue(), timeZone)}</span>
      ),
    }),
  ];
}
