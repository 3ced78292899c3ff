import { createColumnHelper } from '@tanstack/react-table';
import { priceBookKindLabels, type PriceBookItemView } from '@seamwright/shared';
import { Button } from '../../../components/ui/button';
import { formatPrice } from '../utils/money';

const column = createColumnHelper<PriceBookItemView>();

export function priceBookColumns(options: {
  currency: string;
  canWrite: boolean;
  onEdit: (item: PriceBookItemView) => void;
  onDelete: (item: PriceBookItemView) => void;
}) {
  const columns = [
    column.accessor('name', {
      header: 'Name',
      enableSorting: false,
      cell: (info) => (
        <span>
          {info.getValue()}
          {info.row.original.isStarter ? (
            <span className="mt-1 block w-fit rounded bg-sand-100 px-1.5 py-0.5 text-xs text-sand-700">
              starter price — replace with yours
            </span>
          ) : null}
        </span>
      ),
    }),
    column.accessor('kind', {
      header: 'Kind',
      enableSorting: false,
      cell: (info) => priceBookKindLabels[info.getValue()],
      meta: { isHiddenOnPhone: true },
    }),
    column.accessor('key', {
      header: 'Key',
      enableSorting: false,
      meta: { isHiddenOnPhone: true },
    }),
    column.accessor('priceMillicents', {
      header: 'Price',
      enableSorting: false,
      cell: (info) =>
        `${formatPrice(info.getValue(), options.currency)} / ${info.row.original.unit}`,
      meta: { isNumeric: true },
    }),
  ];
  if (!options.canWrite) return columns;
  return [
    ...columns,
    column.display({
      id: 'actions',
      header: 'Actions',
      cell: (info) => (
        <span className="flex flex-col gap-1 sm:flex-row">
          <Button variant="quiet" onClick={() => options.onEdit(info.row.original)}>
            Edit<span className="sr-only"> {info.row.original.name}</span>
          </Button>
          <Button variant="quietDanger" onClick={() => options.onDelete(info.row.original)}>
            Delete<span className="sr-only"> {info.row.original.name}</span>
          </Button>
        </span>
      ),
    }),
  ];
}
