// The owner's numbers for the period: money by month, pipeline, win rate, installed area and
// price, turf planned vs used, crew use and water saved, each with its numbers and its rule.
import type { DashboardView } from '@seamwright/shared';
import { formatCents } from '../../../lib/money';
import { useDashboard } from '../api/get-dashboard';
import { ChartPanel } from './chart-panel';
import { FigureTable } from './figure-table';

const statusLabels: Record<string, string> = {
  lead: 'Lead',
  estimated: 'Estimated',
  accepted: 'Accepted',
  scheduled: 'Scheduled',
  in_progress: 'In progress',
  installed: 'Installed',
  invoiced: 'Invoiced',
};

const number = (value: number) => value.toLocaleString('en-US');
const percent = (rate: number | null) =>
  rate === null ? 'No answers yet' : `${(rate * 100).toFixed(1)} %`;

function Figure({ label, value, note }: { label: string; value: string; note?: string }) {
  return (
    <div className="rounded-lg border border-line bg-white p-4">
      <dt className="text-sm text-ink-muted">{label}</dt>
      <dd className="mt-1 text-2xl font-bold tabular-nums">{value}</dd>
      {note ? <dd className="mt-1 text-xs text-ink-muted">{note}</dd> : null}
    </div>
  );
}

function months(view: DashboardView) {
  const all = new Set([
    ...view.invoicedByMonth.map((m) => m.month),
    ...view.collectedByMonth.map((m) => m.month),
  ]);
  return [...all].sort().map((month) => ({
    month,
    invoiced: view.invoicedByMonth.find((m) => m.month === month)?.cents ?? 0,
    collected: view.collectedByMonth.find((m) => m.month === month)?.cents ?? 0,
  }));
}

export function DashboardPanels({ query, currency }: { query: string; currency: string }) {
  const view = useDashboard(query);
  const money = (cents: number) => formatCents(cents, currency);
  const byMonth = months(view);
  const { installed, material, winRate, waterSaved, crewUtilisation } = view;
  return (
    <div className="flex flex-col gap-4">
      <ChartPanel
        title="Invoiced by month"
        data={byMonth.map((m) => ({ label: m.month, value: m.invoiced }))}
        formatValue={money}
        note="Totals with tax of the invoices issued in each month (not drafts or void ones). Collected: payments received, less what was refunded of them."
        table={
          <FigureTable
            caption="Invoiced and collected by month"
            headings={['Month', 'Invoiced', 'Collected']}
            rows={byMonth.map((m) => [m.month, money(m.invoiced), money(m.collected)])}
          />
        }
      />
      <ChartPanel
        title="Pipeline by job status"
        data={view.pipeline.map((p) => ({
          label: statusLabels[p.status] ?? p.status,
          value: p.valueCents,
        }))}
        formatValue={money}
        note="Jobs not yet paid, lost or cancelled, each at the total of its latest estimate version; as of today."
        table={
          <FigureTable
            caption="Pipeline by job status"
            headings={['Status', 'Jobs', 'Value']}
            rows={view.pipeline.map((p) => [
              statusLabels[p.status] ?? p.status,
              number(p.jobs),
              money(p.valueCents),
            ])}
          />
        }
      />
      <dl className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
        <Figure
          label="Win rate"
          value={percent(winRate.rate)}
          note={`${winRate.accepted} accepted, ${winRate.declined} declined, ${winRate.expired} expired. ${winRate.rule}`}
        />
        <Figure
          label="Installed"
          value={`${number(installed.sqFt)} sq ft`}
          note={`${installed.jobs} jobs. ${installed.rule}`}
        />
        <Figure
          label="Average price per sq ft installed"
          value={
            installed.averageCentsPerSqFt === null
              ? 'None installed'
              : money(installed.averageCentsPerSqFt)
          }
        />
        <Figure
          label="Turf planned vs used"
          value={
            material.jobs === 0
              ? 'No cut turf yet'
              : `${number(material.estimatedSqFt)} / ${number(material.actualSqFt)} sq ft`
          }
          note={`Margin ${number(material.marginSqFt)} sq ft${
            material.marginBasisPoints === null
              ? ''
              : ` (${(material.marginBasisPoints / 100).toFixed(1)} %)`
          }. ${material.rule}`}
        />
        <Figure
          label="Crew utilisation"
          value={crewUtilisation === null ? 'No crews yet' : `${percent(crewUtilisation.rate)}`}
          note={
            crewUtilisation === null
              ? 'Booked against available crew-days, once crews and bookings are set up.'
              : `${crewUtilisation.bookedCrewDays} of ${crewUtilisation.availableCrewDays} crew-days booked.`
          }
        />
        <Figure
          label="Water saved per year"
          value={
            waterSaved.gallonsPerYear === null
              ? 'No figure for your region'
              : `${number(waterSaved.gallonsPerYear)} gal`
          }
          note={`${waterSaved.note}${waterSaved.rule ? ` Source: ${waterSaved.rule.source}.` : ''}`}
        />
      </dl>
    </div>
  );
}
