import { createColumnHelper } from '@tanstack/react-table';
import { Link } from 'react-router-dom';
import type { CustomerView } from '@seamwright/shared';
import { paths } from '../../../config/paths';
import { formatDate } from '../../../lib/format';

const column = createColumnHelper<CustomerView>();
const dash = <span className="text-ink-muted">—</span>;

/** Columns of the customers list; only name and created can be sorted by the server. */
export function customerColumns(timeZone: string) {
  return [
    column.accessor('name', {
      id: 'name',
      header: 'Name',
      cell: (info) => (
        <span className="flex flex-wrap items-center gap-2">
          <Link
            to={paths.customer(info.row.original.id)}
            className="font-semibold underline-offset-2 hover:underline"
          >
            {info.getValue()}
          </Link>
          {info.row.original.archivedAt ? (
            <span className="rounded bg-sand-200 px-2 py-0.5 text-sm text-ink">Archived</span>
          ) : null}
        </span>
      ),
    }),
    column.accessor('phone', {
      header: 'Phone',
      enableSorting: false,
      cell: (info) => {
        const phone = info.getValue();
        return phone ? <span className="tabular-nums whitespace-nowrap">{phone}</span> : dash;
      },
    }),
    column.accessor('email', {
      header: 'E-mail',
      enableSorting: false,
      meta: { isHiddenOnPhone: true },
      cell: (info) => info.getValue() ?? dash,
    }),
    column.accessor('siteCount', {
      header: 'Sites',
      enableSorting: false,
      meta: { isNumeric: true },
      cell: (info) => info.getValue().toLocaleString('en-US'),
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
