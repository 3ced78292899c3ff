import { Link, useNavigate, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { NotAvailable } from '../../components/ui/not-available';
import { PageHeader } from '../../components/ui/page-header';
import { useToast } from '../../components/ui/toast';
import { paths } from '../../config/paths';
import { queryClient } from '../../lib/query-client';
import { useCan, useSession } from '../../lib/session';
import { rollQueryOptions, useRoll } from '../../features/stock/api/get-roll';
import { EditRollForm } from '../../features/stock/components/edit-roll-form';
import { RollDetails } from '../../features/stock/components/roll-details';
import { RouteError } from './route-error';
import { sessionCan } from './guard';

export async function loader({ params }: LoaderFunctionArgs) {
  if (!(await sessionCan('inventory.read'))) return null;
  await queryClient.ensureQueryData(rollQueryOptions(params.rollId ?? ''));
  return null;
}

function RollPage({ rollId }: { rollId: string }) {
  const roll = useRoll(rollId);
  const canWrite = useCan('inventory.write');
  const toast = useToast();
  const navigate = useNavigate();
  return (
    <>
      <p className="mb-2 print:hidden">
        <Link to={paths.stock}>← Stock</Link>
      </p>
      <PageHeader
        title={`${roll.turfProductName}, lot ${roll.dyeLot}`}
        subtitle={roll.isRemnant ? 'A remnant left from a job' : 'A roll in stock'}
      />
      <RollDetails roll={roll} />
      {canWrite ? (
        <section
          aria-labelledby="edit-roll"
          className="mt-6 rounded-lg border border-line bg-white p-4 sm:p-6"
        >
          <h2 id="edit-roll" className="mb-4 text-xl font-bold">
            Correct this roll
          </h2>
          {/* A new form per saved version, so it starts from what the server holds now. */}
          <EditRollForm
            key={roll.updatedAt}
            roll={roll}
            onSaved={() => toast.show('Roll saved.')}
            onCancel={() => void navigate(paths.stock)}
          />
        </section>
      ) : null}
    </>
  );
}

export function Component() {
  const { rollId = '' } = useParams();
  const { role } = useSession();
  if (!useCan('inventory.read'))
    return <NotAvailable section="Stock" role={role} homePath={paths.today} />;
  return <RollPage rollId={rollId} />;
}

export const ErrorBoundary = RouteError;
