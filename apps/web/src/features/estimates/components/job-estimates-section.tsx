import { Link, useNavigate } from 'react-router-dom';
import { Button } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { FormAlert } from '../../../components/ui/form-alert';
import { paths } from '../../../config/paths';
import { formatDate } from '../../../lib/format';
import { formatCents } from '../../../lib/money';
import { useSession } from '../../../lib/session';
import { useCreateEstimate } from '../api/create-estimate';
import { useJobEstimates } from '../api/get-job-estimates';
import { EstimateStatusBadge } from './estimate-status';

const th = 'py-2 pr-3';
const num = `${th} text-right tabular-nums whitespace-nowrap`;

/**
 * The job's estimate versions for the job page, and "Build estimate" (a draft priced from the
 * takeoff). The server says why it cannot build one (no areas, a draft already open, the job's
 * status) and that reason is shown as it is.
 */
export function JobEstimatesSection({
  jobId,
  canBuild,
  onBuilt,
}: {
  jobId: string;
  canBuild: boolean;
  /** The job's own data changed (its activity); the route refreshes it. */
  onBuilt: () => void;
}) {
  const estimates = useJobEstimates(jobId);
  const create = useCreateEstimate(jobId);
  const navigate = useNavigate();
  const { company } = useSession();
  const hasDraft = estimates.some((estimate) => estimate.status === 'draft');
  const build = canBuild && !hasDraft && (
    <Button
      variant={estimates.length ? 'secondary' : 'primary'}
      isBusy={create.isPending}
      onClick={() => {
        create.mutate(
          {},
          {
            onSuccess: (estimate) => {
              onBuilt();
              void navigate(paths.estimate(estimate.id));
            },
          },
        );
      }}
    >
      {create.isPending ? 'Pricing the takeoff…' : 'Build estimate'}
    </Button>
  );
  const alert = create.isError ? <FormAlert>{create.error.message}</FormAlert> : null;
  if (estimates.length === 0)
    return (
      <div className="flex flex-col gap-3">
        {alert}
        <EmptyState title="No estimates yet" action={build || null}>
          Build an estimate from the areas’ takeoff and your price book; you can change every line
          before sending it.
        </EmptyState>
      </div>
    );
  return (
    <div className="flex flex-col gap-3">
      {alert}
      <div className="relative overflow-x-auto rounded-lg border border-line bg-white px-4">
        <table className="w-full border-collapse text-left">
          <caption className="sr-only">Estimate versions of this job</caption>
          <thead>
            <tr className="border-b-2 border-line-strong text-sm text-ink-muted">
              <th scope="col" className={th}>
                Version
              </th>
              <th scope="col" className={th}>
                Status
              </th>
              <th scope="col" className={`${th} text-right`}>
                Total
              </th>
              <th scope="col" className={`${th} hidden text-right sm:table-cell`}>
                Deposit
              </th>
              <th scope="col" className={`py-2 hidden sm:table-cell`}>
                Sent
              </th>
            </tr>
          </thead>
          <tbody>
            {estimates.map((estimate) => (
              <tr key={estimate.id} className="border-b border-line">
                <th scope="row" className={`${th} font-semibold whitespace-nowrap`}>
                  <Link to={paths.estimate(estimate.id)}>Version {estimate.version}</Link>
                </th>
                <td className={th}>
                  <EstimateStatusBadge status={estimate.status} />
                </td>
                <td className={num}>{formatCents(estimate.totalCents, company.currency)}</td>
                <td className={`${num} hidden sm:table-cell`}>
                  {formatCents(estimate.depositCents, company.currency)}
                </td>
                <td className="hidden py-2 whitespace-nowrap sm:table-cell">
                  {estimate.sentAt ? formatDate(estimate.sentAt, company.timeZone) : '—'}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {build ? <div>{build}</div> : null}
    </div>
  );
}
