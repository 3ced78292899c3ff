import { createColumnHelper } from '@tanstack/react-table';
import { Link } from 'react-router-dom';
import type { InvoiceSummaryView } from '@seamwright/shared';
import { paths } from '../../../config/paths';
import { formatCents } from '../../../lib/money';
import { InvoiceStatusBadge } from './invoice-status';

const column = createColumnHelper<InvoiceSummaryView>();

/** Columns of the invoices list, in the server's order (newest number first). */
export function invoiceColumns() {
  return [
    column.accessor('reference', {
      id: 'reference',
      header: 'Invoice',
      enableSorting: false,
      cell: (info) => (
        <Link
          to={paths.invoice(info.row.original.id)}
          className="font-semibold whitespace-nowrap underline-offset-2 hover:underline"
        >
          {info.getValue()}
        </Link>
      ),
    }),
    column.accessor('status', {
      id: 'status',
      header: 'Status',
      enableSorting: false,
      cell: (info) => <InvoiceStatusBadge status={info.getValue()} />,
    }),
    column.accessor('customerName', { id: 'customer', header: 'Customer', enableSorting: false }),
    column.accessor('dueDate', {
      id: 'dueDate',
      header: 'Due',
      enableSorting: false,
      meta: { isHiddenOnPhone: true },
      cell: (info) => <span className="whitespace-nowrap">{info.getValue()}</span>,
    }),
    column.accessor('totalCents', {
      id: 'total',
      header: 'Total',
      enableSorting: false,
      meta: { isNumeric: true, isHiddenOnPhone: true },
      cell: (info) => formatCents(info.getValue(), info.row.original.currency),
    }),
    column.accessor('balanceCents', {
      id: 'balance',
      header: 'Balance',
      enableSorting: false,
      meta: { isNumeric: true },
      cell: (info) => formatCents(info.getValue(), info.row.original.currency),
    }),
  ];
}
