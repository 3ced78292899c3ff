// The only module that imports recharts: the dashboard loads it with React.lazy, so the charts
// come in their own chunk and never weigh on sign-in or the rest of the app.
import { Bar, BarChart, CartesianGrid, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';

export interface BarDatum {
  label: string;
  value: number;
}

export default function SimpleBarChart({
  data,
  formatValue,
  label,
}: {
  data: readonly BarDatum[];
  formatValue: (value: number) => string;
  label: string;
}) {
  return (
    // The table beside the chart carries the same numbers for screen readers.
    <div className="h-56 w-full" role="img" aria-label={label}>
      <ResponsiveContainer width="100%" height="100%">
        <BarChart data={[...data]} margin={{ top: 8, right: 8, bottom: 8, left: 8 }}>
          <CartesianGrid
            strokeDasharray="3 3"
            stroke="var(--color-line, #d6d3cb)"
            vertical={false}
          />
          <XAxis dataKey="label" tick={{ fontSize: 12 }} />
          <YAxis tickFormatter={formatValue} tick={{ fontSize: 12 }} width={80} />
          <Tooltip formatter={(value) => formatValue(Number(value))} />
          <Bar dataKey="value" fill="var(--color-moss-700, #3f5f2f)" isAnimationActive={false} />
        </BarChart>
      </ResponsiveContainer>
    </div>
  );
}
