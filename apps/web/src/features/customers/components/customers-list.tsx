import { useCallback, useMemo } from 'react';
import { Link } from 'react-router-dom';
import { customerStatuses } from '@seamwright/shared';
import { DataTable } from '../../../components/ui/data-table';
import { EmptyState } from '../../../components/ui/empty-state';
import { listQueryFrame } from '../../../components/ui/list-query-frame';
import { SelectField } from '../../../components/ui/form-fields';
import { buttonClasses } from '../../../components/ui/button';
import { paths } from '../../../config/paths';
import { useCan, useSession } from '../../../lib/session';
import { useUrlListParams } from '../../../lib/use-url-list-params';
import { useCustomers } from '../api/get-customers';
import {
  customerPageSizes,
  joinSort,
  parseCustomerListParams,
  splitSort,
  toCustomerSearchParams,
} from '../utils/list-params';
import { customerColumns } from './customer-columns';
import { SearchBox } from '../../../components/ui/search-box';

const statusLabels: Record<(typeof customerStatuses)[number], string> = {
  active: 'Active',
  archived: 'Archived',
  all: 'All',
};

/** The customers list; every bit of its state is in the URL, so it survives a reload. */
export function CustomersList() {
  const { params, update } = useUrlListParams(parseCustomerListParams, toCustomerSearchParams, 'q');
  const { company } = useSession();
  const canWrite = useCan('customers.write');
  const columns = useMemo(() => customerColumns(company.timeZone), [company.timeZone]);
  const query = useCustomers(params);

  const onSearch = useCallback((q: string) => update({ q }), [update]);

  const filters = (
    <div className="mb-4 flex flex-wrap items-end gap-4 print:hidden">
      <SearchBox label="Search customers" value={params.q} onSearch={onSearch} />
      <SelectField
        label="Show"
        value={params.status}
        onChange={(event) =>
          update({ status: customerStatuses.find((s) => s === event.target.value) ?? 'active' })
        }
        wrapperClassName="w-40"
      >
        {customerStatuses.map((status) => (
          <option key={status} value={status}>
            {statusLabels[status]}
          </option>
        ))}
      </SelectField>
    </div>
  );

  const pending = listQueryFrame(query, filters, 'Loading customers…');
  if (pending || !query.data) return pending;

  const { data, meta } = query.data;
  if (meta.total === 0) {
    const isFiltered = params.q !== '' || params.status !== 'active';
    return (
      <>
        {filters}
        {isFiltered ? (
          <EmptyState title="No customers match">
            Try another search, or show all customers including archived ones.
          </EmptyState>
        ) : (
          <EmptyState
            title="No customers yet"
            action={
              canWrite ? (
                <Link to={paths.newCustomer} className={buttonClasses('primary')}>
                  Add your first customer
                </Link>
              ) : null
            }
          >
            Every job starts with a customer and the site where the turf goes. Add one to begin.
          </EmptyState>
        )}
      </>
    );
  }

  return (
    <>
      {filters}
      <DataTable
        caption="Customers"
        columns={columns}
        data={data}
        total={meta.total}
        page={params.page}
        pageSize={params.pageSize}
        pageSizeOptions={customerPageSizes}
        sort={splitSort(params.sort)}
        isFetching={query.isPlaceholderData}
        onSortChange={(sort) => update({ sort: joinSort(sort.field, sort.direction) })}
        onPageChange={(page) => update({ page })}
        onPageSizeChange={(pageSize) =>
          update({ pageSize: customerPageSizes.find((s) => s === pageSize) ?? 25 })
        }
      />
    </>
  );
}
