import {
  flexRender,
  getCoreRowModel,
  useReactTable,
  type ColumnDef,
  type RowData,
  type SortingState,
  type Updater,
} from '@tanstack/react-table';
import { cn } from './cn';
import { Pager } from './pager';

declare module '@tanstack/react-table' {
  // Declaration merging needs the library's own generic names, used or not.
  // eslint-disable-next-line @typescript-eslint/no-unused-vars
  interface ColumnMeta<TData extends RowData, TValue> {
    /** Right-aligned with tabular figures, so digits line up down the column. */
    isNumeric?: boolean;
    /** Left out on phone widths, where only the columns that identify a row fit. */
    isHiddenOnPhone?: boolean;
  }
}

export interface SortState {
  field: string;
  direction: 'asc' | 'desc';
}

interface DataTableProps<T> {
  caption: string;
  // Column definitions mix value types per column; the library's own examples use `any` here.
  // eslint-disable-next-line @typescript-eslint/no-explicit-any
  columns: ColumnDef<T, any>[];
  data: T[];
  total: number;
  page: number;
  pageSize: number;
  pageSizeOptions: readonly number[];
  sort: SortState;
  isFetching?: boolean;
  onSortChange: (sort: SortState) => void;
  onPageChange: (page: number) => void;
  onPageSizeChange: (pageSize: number) => void;
}

/**
 * The one table of the app. Manual mode: the server sorts and pages; this renders what it got
 * and reports clicks back to the caller, who keeps the state in the URL.
 */
export function DataTable<T>(props: DataTableProps<T>) {
  const { caption, columns, data, total, page, pageSize, sort, isFetching } = props;
  const sorting: SortingState = [{ id: sort.field, desc: sort.direction === 'desc' }];

  // We do not use the React Compiler; the table instance is rebuilt on each render on purpose.
  // eslint-disable-next-line react-hooks/incompatible-library
  const table = useReactTable({
    data,
    columns,
    getCoreRowModel: getCoreRowModel(),
    manualSorting: true,
    manualPagination: true,
    enableSortingRemoval: false,
    rowCount: total,
    state: { sorting, pagination: { pageIndex: page - 1, pageSize } },
    onSortingChange: (updater: Updater<SortingState>) => {
      const next = typeof updater === 'function' ? updater(sorting) : updater;
      const first = next[0];
      if (first) props.onSortChange({ field: first.id, direction: first.desc ? 'desc' : 'asc' });
    },
  });

  return (
    <div
      className={cn('transition-opacity', isFetching && 'opacity-70')}
      aria-busy={isFetching || undefined}
    >
      <div className="overflow-x-auto rounded-lg border border-line bg-white">
        <table className="w-full border-collapse text-left">
          <caption className="sr-only">{caption}</caption>
          <thead className="bg-sand-100">
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => {
                  const isNumeric = header.column.columnDef.meta?.isNumeric;
                  const sorted = header.column.getIsSorted();
                  const canSort = header.column.getCanSort();
                  return (
                    <th
                      key={header.id}
                      scope="col"
                      aria-sort={
                        sorted ? (sorted === 'asc' ? 'ascending' : 'descending') : undefined
                      }
                      className={cn(
                        'border-b border-line px-4 py-2 font-semibold whitespace-nowrap',
                        isNumeric && 'text-right',
                        header.column.columnDef.meta?.isHiddenOnPhone && 'hidden sm:table-cell',
                      )}
                    >
                      {canSort ? (
                        <button
                          type="button"
                          className="inline-flex min-h-11 items-center gap-1 font-semibold text-ink hover:underline"
                          onClick={header.column.getToggleSortingHandler()}
                        >
                          {flexRender(header.column.columnDef.header, header.getContext())}
                          <span aria-hidden="true" className="text-ink-muted">
                            {sorted === 'asc' ? '▲' : sorted === 'desc' ? '▼' : '↕'}
                          </span>
                        </button>
                      ) : (
                        flexRender(header.column.columnDef.header, header.getContext())
                      )}
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((row) => (
              <tr key={row.id} className="border-b border-line last:border-b-0 hover:bg-sand-50">
                {row.getVisibleCells().map((cell) => (
                  <td
                    key={cell.id}
                    className={cn(
                      'px-4 py-3 align-top',
                      cell.column.columnDef.meta?.isNumeric && 'text-right tabular-nums',
                      cell.column.columnDef.meta?.isHiddenOnPhone && 'hidden sm:table-cell',
                    )}
                  >
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <Pager
        page={page}
        pageSize={pageSize}
        total={total}
        pageSizeOptions={props.pageSizeOptions}
        onPageChange={props.onPageChange}
        onPageSizeChange={props.onPageSizeChange}
      />
    </div>
  );
}
