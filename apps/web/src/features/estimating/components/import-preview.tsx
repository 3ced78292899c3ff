import type { PriceBookImportPreview } from '@seamwright/shared';
import { formatPrice } from '../utils/money';

/** The rows of a CSV as they would be imported, each with its errors by column. */
export function ImportPreview({
  preview,
  currency,
}: {
  preview: PriceBookImportPreview;
  currency: string;
}) {
  const { summary } = preview;
  return (
    <div className="flex flex-col gap-2">
      <p role="status">
        {summary.total} rows: {summary.create} new, {summary.update} updated
        {summary.withErrors > 0 ? `, ${summary.withErrors} with errors` : ''}.
      </p>
      <div className="overflow-x-auto rounded-lg border border-line bg-white">
        <table className="w-full border-collapse text-left text-sm">
          <caption className="sr-only">Import preview</caption>
          <thead className="bg-sand-100">
            <tr>
              <th scope="col" className="px-3 py-2">
                Line
              </th>
              <th scope="col" className="px-3 py-2">
                Action
              </th>
              <th scope="col" className="px-3 py-2">
                Key
              </th>
              <th scope="col" className="px-3 py-2">
                Name
              </th>
              <th scope="col" className="px-3 py-2 text-right">
                Price
              </th>
              <th scope="col" className="px-3 py-2">
                Problems
              </th>
            </tr>
          </thead>
          <tbody>
            {preview.rows.map((row) => (
              <tr
                key={row.line}
                className={
                  row.errors.length > 0
                    ? 'border-t border-line bg-brick-50'
                    : 'border-t border-line'
                }
              >
                <td className="px-3 py-2 tabular-nums">{row.line}</td>
                <td className="px-3 py-2">{row.action === 'create' ? 'New' : 'Update'}</td>
                <td className="px-3 py-2">{row.item?.key ?? row.raw.key}</td>
                <td className="px-3 py-2">{row.item?.name ?? row.raw.name}</td>
                <td className="px-3 py-2 text-right tabular-nums">
                  {row.item ? formatPrice(row.item.priceMillicents, currency) : row.raw.price}
                </td>
                <td className="px-3 py-2">
                  {row.errors.length === 0 ? (
                    'OK'
                  ) : (
                    <ul className="text-brick-700">
                      {row.errors.map((error) => (
                        <li key={error.field}>
                          <span className="font-semibold">{error.field}</span>: {error.message}
                        </li>
                      ))}
                    </ul>
                  )}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
