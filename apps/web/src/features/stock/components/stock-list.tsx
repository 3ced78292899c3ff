import { useMemo } from 'react';
import { Link } from 'react-router-dom';
import { DataTable } from '../../../components/ui/data-table';
import { EmptyState } from '../../../components/ui/empty-state';
import { listQueryFrame } from '../../../components/ui/list-query-frame';
import { buttonClasses } from '../../../components/ui/button';
import { paths } from '../../../config/paths';
import { useCan } from '../../../lib/session';
import { useUrlListParams } from '../../../lib/use-url-list-params';
import { useUnits } from '../../../lib/units';
import { useRolls } from '../api/get-rolls';
import {
  isFiltered,
  parseStockListParams,
  stockPageSizes,
  toStockSearchParams,
} from '../utils/list-params';
import { RollCautions } from './roll-cautions';
import { stockColumns } from './stock-columns';
import { StockFilters } from './stock-filters';

/** The order the server lists rolls in; shown on the product column, not changeable. */
const serverOrder = { field: 'product', direction: 'asc' } as const;

/** Rolls and remnants in stock; every bit of the list's state is in the URL. */
export function StockList() {
  const { params, update } = useUrlListParams(parseStockListParams, toStockSearchParams, 'dyeLot');
  const units = useUnits();
  const canWrite = useCan('inventory.write');
  const columns = useMemo(() => stockColumns(units), [units]);
  const query = useRolls(params);

  const filters = <StockFilters params={params} onChange={update} />;
  const pending = listQueryFrame(query, filters, 'Loading stock…');
  if (pending || !query.data) return pending;

  const { data, meta } = query.data;
  if (meta.total === 0)
    return (
      <>
        {filters}
        {isFiltered(params) ? (
          <EmptyState title="No rolls match">
            Try every product, another dye lot, or show used-up and archived rolls too.
          </EmptyState>
        ) : (
          <EmptyState
            title="No turf in stock yet"
            action={
              canWrite ? (
                <Link to={paths.receiveStock} className={buttonClasses('primary')}>
                  Receive a delivery
                </Link>
              ) : null
            }
          >
            {canWrite
              ? 'When turf arrives, choose “Receive a delivery” and enter the product, the dye lot from the labels and each roll’s width and length. Jobs then reserve their pieces from these rolls.'
              : 'The office records turf here when a delivery arrives; ask them to receive it.'}
          </EmptyState>
        )}
      </>
    );

  const onShelf = data
    .filter((roll) => !roll.archived)
    .map((roll) => ({ widthFt: roll.widthFt, lengthFt: roll.remainingFt }));
  return (
    <>
      {filters}
      <DataTable
        caption="Rolls and remnants"
        columns={columns}
        data={data}
        total={meta.total}
        page={params.page}
        pageSize={params.pageSize}
        pageSizeOptions={stockPageSizes}
        sort={serverOrder}
        isFetching={query.isPlaceholderData}
        onSortChange={() => undefined}
        onPageChange={(page) => update({ page })}
        onPageSizeChange={(pageSize) =>
          update({ pageSize: stockPageSizes.find((s) => s === pageSize) ?? 25 })
        }
      />
      {/* After the list, so on a phone the rolls come first; the caution stays on the page. */}
      <RollCautions rolls={onShelf} className="mt-6" />
    </>
  );
}
