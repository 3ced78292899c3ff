import { agingBucketNames, type AgingBucketName } from '@seamwright/domain';
import { formatCents } from '../../../lib/money';
import { useAging } from '../api/get-aging';

const bucketLabels: Record<AgingBucketName, string> = {
  current: 'Current',
  days1to30: '1–30 days',
  days31to60: '31–60 days',
  days61to90: '61–90 days',
  over90: 'Over 90 days',
};

/** What each customer owes by days past due, with the totals row; a statement per customer. */
export function AgingTable({
  asOf,
  currency,
  statementHref,
}: {
  asOf: string | null;
  currency: string;
  statementHref: (customerId: string) => string;
}) {
  const report = useAging(asOf);
  const money = (cents: number) => formatCents(cents, currency);
  return (
    <div className="relative overflow-x-auto rounded-lg border border-line bg-white">
      <table className="w-full text-sm tabular-nums">
        <caption className="px-4 py-2 text-left text-ink-muted">
          Owed as of {report.asOf}, by days past the due date.
        </caption>
        <thead>
          <tr className="border-b border-line text-left text-ink-muted">
            <th scope="col" className="px-4 py-2">
              Customer
            </th>
            {agingBucketNames.map((name) => (
              <th key={name} scope="col" className="px-2 py-2 text-right">
                {bucketLabels[name]}
              </th>
            ))}
            <th scope="col" className="px-2 py-2 text-right">
              Total
            </th>
            <th scope="col" className="px-4 py-2 text-right">
              <span className="sr-only">Statement</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {report.customers.length === 0 ? (
            <tr>
              <td colSpan={8} className="px-4 py-3 text-ink-muted">
                Nobody owes anything. Sent invoices that are not paid show here.
              </td>
            </tr>
          ) : (
            report.customers.map((c) => (
              <tr key={c.customerId} className="border-b border-line">
                <th scope="row" className="px-4 py-2 text-left font-semibold">
                  {c.name}
                </th>
                {agingBucketNames.map((name) => (
                  <td
                    key={name}
                    className={`px-2 py-2 text-right ${name === 'over90' && c.buckets.over90 > 0 ? 'text-brick-700' : ''}`}
                  >
                    {money(c.buckets[name])}
                  </td>
                ))}
                <td className="px-2 py-2 text-right font-semibold">{money(c.totalCents)}</td>
                <td className="px-4 py-2 text-right">
                  <a href={statementHref(c.customerId)}>
                    Statement<span className="sr-only"> for {c.name}</span>
                  </a>
                </td>
              </tr>
            ))
          )}
        </tbody>
        <tfoot>
          <tr className="font-bold">
            <th scope="row" className="px-4 py-2 text-left">
              All customers
            </th>
            {agingBucketNames.map((name) => (
              <td key={name} className="px-2 py-2 text-right">
                {money(report.buckets[name])}
              </td>
            ))}
            <td className="px-2 py-2 text-right">{money(report.totalCents)}</td>
            <td />
          </tr>
        </tfoot>
      </table>
    </div>
  );
}
