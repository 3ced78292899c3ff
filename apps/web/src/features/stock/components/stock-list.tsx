import { useCallback, useMemo } from 'react';
import { Link, useSearchParams } from 'react-router-dom';
import { DataTable } from '../../../components/ui/data-table';
import { EmptyState } from '../../../components/ui/empty-state';
import { ErrorPanel } from '../../../components/ui/region-error';
import { Loading } from '../../../components/ui/loading';
import { buttonClasses } from '../../../components/ui/button';
import { paths } from '../../../config/paths';
import { useCan } from '../../../lib/session';
import { useUnits } from '../../../lib/units';
import { useRolls } from '../api/get-rolls';
import {
  isFiltered,
  parseStockListParams,
  stockPageSizes,
  toStockSearchParams,
  type StockListParams,
} from '../utils/list-params';
import { RollCautions } from './roll-cautions';
import { stockColumns } from './stock-columns';
import { StockFilters } from './stock-filters';

/** The order the server lists rolls in; shown on the product column, not changeable. */
const serverOrder = { field: 'product', direction: 'asc' } as const;

/** Rolls and remnants in stock; every bit of the list's state is in the URL. */
export function StockList() {
  const [searchParams, setSearchParams] = useSearchParams();
  const params = useMemo(() => parseStockListParams(searchParams), [searchParams]);
  const units = useUnits();
  const canWrite = useCan('inventory.write');
  const columns = useMemo(() => stockColumns(units), [units]);
  const query = useRolls(params);

  const update = useCallback(
    (change: Partial<StockListParams>) => {
      // Any change other than the page itself starts again at page 1.
      const next = { ...params, page: 1, ...change };
      setSearchParams(toStockSearchParams(next), {
        replace: !('page' in change) && 'dyeLot' in change,
      });
    },
    [params, setSearchParams],
  );

  const filters = <StockFilters params={params} onChange={update} />;
  if (query.isPending)
    return (
      <>
        {filters}
        <Loading label="Loading stock…" />
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
