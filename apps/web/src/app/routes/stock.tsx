import { paths } from '../../config/paths';
import { rollsQueryOptions } from '../../features/stock/api/get-rolls';
import { StockList } from '../../features/stock/components/stock-list';
import { parseStockListParams } from '../../features/stock/utils/list-params';
import { ListPage, listLoader, revalidateOnPathChange } from './list-route';
import { RouteError } from './route-error';

export const loader = listLoader('inventory.read', parseStockListParams, rollsQueryOptions);
export const shouldRevalidate = revalidateOnPathChange;

export function Component() {
  return (
    <ListPage
      title="Stock"
      subtitle="Turf rolls and remnants by dye lot, and what jobs hold of them."
      readAction="inventory.read"
      writeAction="inventory.write"
      newPath={paths.receiveStock}
      newLabel="Receive a delivery"
    >
      <StockList />
    </ListPage>
  );
}

export const ErrorBoundary = RouteError;
