import { createColumnHelper } from '@tanstack/react-table';
import { Link } from 'react-router-dom';
import type { RollView } from '@seamwright/shared';
import { paths } from '../../../config/paths';
import type { Units } from '../../../lib/units';
import { formatDay, kindLabel } from '../utils/roll-words';

const column = createColumnHelper<RollView>();

/** Columns of the stock list; the server orders by product, lot, rolls before remnants. */
export function stockColumns(units: Units) {
  const length = (feet: number) => <span className="whitespace-nowrap">{units.length(feet)}</span>;
  return [
    column.accessor('turfProductName', {
      id: 'product',
      header: 'Product',
      enableSorting: false,
      cell: (info) => {
        const roll = info.row.original;
        return (
          <>
            <Link to={paths.roll(roll.id)} className="font-semibold underline-offset-2">
              {info.getValue()}
            </Link>
            {roll.archived ? <span className="ml-2 text-sm text-ink-muted">(archived)</span> : null}
            {/* On a phone the lot, kind and place ride under the name instead of in columns. */}
            <span className="mt-0.5 block text-sm text-ink-muted sm:hidden">
              Lot {roll.dyeLot} · {kindLabel(roll)}
              {roll.location ? ` · ${roll.location}` : ''}
            </span>
          </>
        );
      },
    }),
    column.accessor('dyeLot', {
      header: 'Dye lot',
      enableSorting: false,
      meta: { isHiddenOnPhone: true },
      cell: (info) => <span className="whitespace-nowrap">{info.getValue()}</span>,
    }),
    column.accessor((roll) => kindLabel(roll), {
      id: 'kind',
      header: 'Roll or remnant',
      enableSorting: false,
      meta: { isHiddenOnPhone: true },
    }),
    column.accessor('widthFt', {
      header: 'Width',
      enableSorting: false,
      meta: { isNumeric: true },
      cell: (info) => length(info.getValue()),
    }),
    column.accessor('remainingFt', {
      // Narrow phones get the short word, so the product keeps room.
      header: () => (
        <>
          <span className="sm:hidden">Left</span>
          <span className="hidden sm:inline">Length left</span>
        </>
      ),
      enableSorting: false,
      meta: { isNumeric: true },
      cell: (info) => length(info.getValue()),
    }),
    column.accessor('heldFt', {
      header: 'Held by jobs',
      enableSorting: false,
      meta: { isNumeric: true, isHiddenOnPhone: true },
      cell: (info) => (info.getValue() > 0 ? length(info.getValue()) : '—'),
    }),
    column.accessor('availableFt', {
      header: 'Free',
      enableSorting: false,
      meta: { isNumeric: true },
      cell: (info) => length(info.getValue()),
    }),
    column.accessor('location', {
      header: 'Location',
      enableSorting: false,
      meta: { isHiddenOnPhone: true },
      cell: (info) => info.getValue() ?? '—',
    }),
    column.accessor('receivedOn', {
      header: 'Received',
      enableSorting: false,
      meta: { isNumeric: true, isHiddenOnPhone: true },
      cell: (info) => {
        const day = info.getValue();
        return <span className="whitespace-nowrap">{day ? formatDay(day) : '—'}</span>;
      },
    }),
  ];
}
