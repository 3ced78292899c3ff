import { Link } from 'react-router-dom';
import { buttonClasses } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { paths } from '../../../config/paths';
import { useJobAreas } from '../api/get-job-areas';
import { useJobTakeoff } from '../api/get-job-takeoff';
import { JobAreasTable } from './job-areas-table';
import { TakeoffTable } from '../../../components/plan/takeoff-table';

/**
 * The job's areas and their takeoff, for the job page. Areas can be added while the job is
 * a lead or estimated (the API refuses later changes with 409).
 */
export function JobAreasSection({ jobId, canAdd }: { jobId: string; canAdd: boolean }) {
  const areas = useJobAreas(jobId);
  const takeoff = useJobTakeoff(jobId);
  const addLink = canAdd ? (
    <Link
      to={paths.newArea(jobId)}
      className={buttonClasses(areas.length ? 'secondary' : 'primary')}
    >
      Add area
    </Link>
  ) : null;
  if (areas.length === 0)
    return (
      <EmptyState title="No areas yet" action={addLink}>
        Draw each lawn, dog run or play area of this job: the plan, its seams and cuts, and the
        materials it takes.
      </EmptyState>
    );
  return (
    <div className="flex flex-col gap-6">
      <JobAreasTable areas={areas} />
      {addLink ? <div>{addLink}</div> : null}
      <section aria-labelledby="job-takeoff-heading" className="flex flex-col gap-3">
        <h3 id="job-takeoff-heading" className="text-lg font-bold">
          Material takeoff
        </h3>
        <p className="text-ink-muted">
          All areas added up, with your company’s estimating settings.
        </p>
        {takeoff.lines.length > 0 ? (
          <TakeoffTable lines={takeoff.lines} caption="Material takeoff for the whole job" />
        ) : (
          <p>No materials yet.</p>
        )}
      </section>
    </div>
  );
}
