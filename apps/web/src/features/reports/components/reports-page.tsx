// /reports: the owner's dashboard (owner only) and, for the owner and the bookkeeper, the aging
// of receivables with a statement per customer and the CSV exports. The period and crew live
// in the URL.
import { Suspense, type ReactNode } from 'react';
import { Loading } from '../../../components/ui/loading';
import { PageHeader } from '../../../components/ui/page-header';
import { RegionErrorBoundary } from '../../../components/ui/region-error';
import { useUrlListParams } from '../../../lib/use-url-list-params';
import { parseReportParams, periodQuery, reportSearch } from '../utils/report-params';
import { AgingTable } from './aging-table';
import { DashboardPanels } from './dashboard-panels';
import { ExportLinks } from './export-links';
import { ReportFilters } from './report-filters';

function Section({ id, title, children }: { id: string; title: string; children: ReactNode }) {
  return (
    <section aria-labelledby={`${id}-heading`} className="flex flex-col gap-3">
      <h2 id={`${id}-heading`} className="text-xl font-bold">
        {title}
      </h2>
      <RegionErrorBoundary>
        <Suspense fallback={<Loading />}>{children}</Suspense>
      </RegionErrorBoundary>
    </section>
  );
}

export function ReportsPage({
  currency,
  canSeeDashboard,
}: {
  currency: string;
  canSeeDashboard: boolean;
}) {
  const { params, update } = useUrlListParams(parseReportParams, reportSearch, 'from');
  return (
    <div className="flex max-w-6xl flex-col gap-8">
      <PageHeader
        title="Reports"
        subtitle={
          canSeeDashboard
            ? 'Money in and out, the pipeline and the work installed, for the period you choose.'
            : 'What customers owe, and the files for your accountant.'
        }
        actions={<ExportLinks query={periodQuery(params, false)} />}
      />
      <ReportFilters
        key={`${params.from}-${params.to}`}
        params={params}
        onApply={update}
        showCrew={canSeeDashboard}
      />
      {canSeeDashboard ? (
        <Section id="dashboard" title="The numbers">
          <DashboardPanels query={periodQuery(params, true)} currency={currency} />
        </Section>
      ) : null}
      <Section id="aging" title="Receivables aging">
        <AgingTable
          asOf={params.to}
          currency={currency}
          statementHref={(id) => `/api/customers/${encodeURIComponent(id)}/statement.pdf`}
        />
      </Section>
    </div>
  );
}
