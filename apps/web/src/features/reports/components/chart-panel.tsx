import { lazy, Suspense, type ReactNode } from 'react';
import { Loading } from '../../../components/ui/loading';
import type { BarDatum } from './bar-chart';

const SimpleBarChart = lazy(() => import('./bar-chart'));

/** A titled panel: the chart (lazy) and, beside it, the table of its numbers. */
export function ChartPanel({
  title,
  data,
  formatValue,
  table,
  note,
}: {
  title: string;
  data: readonly BarDatum[];
  formatValue: (value: number) => string;
  table: ReactNode;
  note?: string;
}) {
  return (
    <section className="rounded-lg border border-line bg-white p-4" aria-label={title}>
      <h3 className="mb-2 text-lg font-bold">{title}</h3>
      <div className="grid gap-4 lg:grid-cols-[3fr_2fr]">
        <Suspense fallback={<Loading label="Loading the chart…" />}>
          <SimpleBarChart data={data} formatValue={formatValue} label={title} />
        </Suspense>
        {table}
      </div>
      {note ? <p className="mt-2 text-xs text-ink-muted">{note}</p> : null}
    </section>
  );
}
