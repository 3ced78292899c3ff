import { useState, type FormEvent } from 'react';
import { Button } from '../../../components/ui/button';
import type { ReportParams } from '../utils/report-params';

/** The period and crew, applied together so the URL changes once per choice. */
export function ReportFilters({
  params,
  onApply,
  showCrew,
}: {
  params: ReportParams;
  onApply: (change: Partial<ReportParams>) => void;
  showCrew: boolean;
}) {
  const [from, setFrom] = useState(params.from ?? '');
  const [to, setTo] = useState(params.to ?? '');
  const submit = (event: FormEvent) => {
    event.preventDefault();
    onApply({ from: from || null, to: to || null });
  };
  const field = 'min-h-11 rounded-md border border-line-strong bg-white px-3 py-2';
  return (
    <form
      onSubmit={submit}
      className="flex flex-wrap items-end gap-3 print:hidden"
      aria-label="Period"
    >
      <label className="flex flex-col text-sm font-semibold">
        From
        <input
          type="date"
          className={field}
          value={from}
          onChange={(e) => setFrom(e.target.value)}
        />
      </label>
      <label className="flex flex-col text-sm font-semibold">
        To
        <input type="date" className={field} value={to} onChange={(e) => setTo(e.target.value)} />
      </label>
      {showCrew ? (
        <label className="flex flex-col text-sm font-semibold">
          Crew
          {/* No crews exist until the calendar work lands; the filter is kept in the URL. */}
          <select className={field} value={params.crewId ?? ''} disabled>
            <option value="">All crews (no crews yet)</option>
          </select>
        </label>
      ) : null}
      <Button type="submit" variant="secondary">
        Show
      </Button>
      {params.from || params.to ? (
        <Button
          type="button"
          variant="quiet"
          onClick={() => {
            setFrom('');
            setTo('');
            onApply({ from: null, to: null });
          }}
        >
          Last 12 months
        </Button>
      ) : null}
    </form>
  );
}
