import { useId, useMemo, useState } from 'react';
import {
  priceBookKindLabels,
  priceBookKinds,
  type PriceBookItemView,
  type PriceBookKind,
} from '@seamwright/shared';
import { buttonClasses } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { DataTable } from '../../../components/ui/data-table';
import {
  priceBookExportUrl,
  useCreatePriceBookItem,
  useDeletePriceBookItem,
  usePriceBook,
  useUpdatePriceBookItem,
} from '../api/price-book';
import { ImportPanel } from './import-panel';
import { priceBookColumns } from './price-book-columns';
import { NewItemForm, PriceItemForm } from './price-item-form';

/** The price book: filter, search, edit, delete, CSV export and import. */
export function PriceBookPanel({ currency, canWrite }: { currency: string; canWrite: boolean }) {
  const kindId = useId();
  const searchId = useId();
  const [kind, setKind] = useState<PriceBookKind | ''>('');
  const [q, setQ] = useState('');
  const [page, setPage] = useState(1);
  const [pageSize, setPageSize] = useState(25);
  const [editing, setEditing] = useState<PriceBookItemView | null>(null);
  const [deleting, setDeleting] = useState<PriceBookItemView | null>(null);
  const [isAdding, setIsAdding] = useState(false);
  const query = { page, pageSize, ...(kind ? { kind } : {}), ...(q.trim() ? { q: q.trim() } : {}) };
  const list = usePriceBook(query);
  const create = useCreatePriceBookItem();
  const update = useUpdatePriceBookItem();
  const remove = useDeletePriceBookItem();
  const columns = useMemo(
    () => priceBookColumns({ currency, canWrite, onEdit: setEditing, onDelete: setDeleting }),
    [currency, canWrite],
  );

  return (
    <div className="flex flex-col gap-4">
      <div className="flex flex-wrap items-end gap-3">
        <div className="flex flex-col gap-1">
          <label htmlFor={kindId} className="text-sm font-semibold">
            Kind
          </label>
          <select
            id={kindId}
            value={kind}
            className="rounded border border-line-strong bg-white px-2 py-2"
            onChange={(event) => {
              setKind(event.target.value as PriceBookKind | '');
              setPage(1);
            }}
          >
            <option value="">All kinds</option>
            {priceBookKinds.map((k) => (
              <option key={k} value={k}>
                {priceBookKindLabels[k]}
              </option>
            ))}
          </select>
        </div>
        <div className="flex min-w-48 flex-1 flex-col gap-1">
          <label htmlFor={searchId} className="text-sm font-semibold">
            Search the price book
          </label>
          <input
            id={searchId}
            type="search"
            value={q}
            className="rounded border border-line-strong bg-white px-2 py-2"
            onChange={(event) => {
              setQ(event.target.value);
              setPage(1);
            }}
          />
        </div>
        <a className={buttonClasses('secondary')} href={priceBookExportUrl} download>
          Export CSV
        </a>
        {canWrite ? (
          <button
            type="button"
            className={buttonClasses('secondary')}
            onClick={() => setIsAdding(!isAdding)}
          >
            {isAdding ? 'Close new item' : 'Add item'}
          </button>
        ) : null}
      </div>
      {isAdding ? (
        <div className="rounded-lg border border-line bg-white p-4">
          <NewItemForm
            onSubmit={async (values) => {
              await create.mutateAsync({ ...values, packSize: null, attributes: {} });
              setIsAdding(false);
            }}
          />
        </div>
      ) : null}
      {list.data ? (
        <DataTable
          caption="Price book"
          columns={columns}
          data={list.data.data}
          total={list.data.meta.total}
          page={page}
          pageSize={pageSize}
          pageSizeOptions={[25, 50, 100]}
          sort={{ field: 'name', direction: 'asc' }}
          isFetching={list.isFetching}
          onSortChange={() => undefined}
          onPageChange={setPage}
          onPageSizeChange={(size) => {
            setPageSize(size);
            setPage(1);
          }}
        />
      ) : (
        <p>Loading the price book…</p>
      )}
      {editing ? (
        <section
          aria-label={`Edit ${editing.name}`}
          className="rounded-lg border border-line bg-white p-4"
        >
          <h3 className="mb-2 font-semibold">Edit {editing.name}</h3>
          <PriceItemForm
            key={editing.id}
            item={editing}
            onSubmit={async (input) => {
              await update.mutateAsync({ id: editing.id, input });
              setEditing(null);
            }}
          />
        </section>
      ) : null}
      {canWrite ? <ImportPanel currency={currency} /> : null}
      <ConfirmDialog
        isOpen={deleting !== null}
        title={`Delete ${deleting?.name ?? 'item'}?`}
        confirmLabel="Delete item"
        isBusy={remove.isPending}
        onCancel={() => setDeleting(null)}
        onConfirm={() => {
          if (!deleting) return;
          void remove.mutateAsync(deleting.id).then(() => setDeleting(null));
        }}
      >
        <p>Estimates made later will no longer find this price.</p>
      </ConfirmDialog>
    </div>
  );
}
