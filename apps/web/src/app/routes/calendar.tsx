import { Link } from 'react-router-dom';
import { PageHeader } from '../../components/ui/page-header';
import { paths } from '../../config/paths';
import { useCan } from '../../lib/session';
import { CalendarScreen } from '../../features/calendar/components/calendar-screen';
import { RouteError } from './route-error';

export function Component() {
  const canManage = useCan('crews.manage');
  return (
    <div className="flex flex-col gap-4">
      <PageHeader
        title="Calendar"
        subtitle="Crew bookings by day, with each crew's colour and name."
        actions={canManage ? <Link to={paths.crews}>Crews</Link> : undefined}
      />
      <CalendarScreen />
    </div>
  );
}

export const ErrorBoundary = RouteError;
