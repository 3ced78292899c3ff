import type { ReactNode } from 'react';

/** The numbers behind a chart, as a small table beside it (and its text alternative). */
export function FigureTable({
  caption,
  headings,
  rows,
}: {
  caption: string;
  headings: readonly string[];
  rows: readonly (readonly ReactNode[])[];
}) {
  return (
    <div className="relative overflow-x-auto">
      <table className="w-full text-sm tabular-nums">
        <caption className="sr-only">{caption}</caption>
        <thead>
          <tr className="border-b border-line text-left text-ink-muted">
            {headings.map((h, i) => (
              <th
                key={h}
                scope="col"
                className={`py-1 pr-3 font-semibold ${i > 0 ? 'text-right' : ''}`}
              >
                {h}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.length === 0 ? (
            <tr>
              <td colSpan={headings.length} className="py-2 text-ink-muted">
                Nothing in this period.
              </td>
            </tr>
          ) : (
            rows.map((row, r) => (
              <tr key={r} className="border-b border-line last:border-0">
                {row.map((cell, i) => (
                  <td key={i} className={`py-1 pr-3 ${i > 0 ? 'text-right' : ''}`}>
                    {cell}
                  </td>
                ))}
              </tr>
            ))
          )}
        </tbody>
      </table>
    </div>
  );
}
