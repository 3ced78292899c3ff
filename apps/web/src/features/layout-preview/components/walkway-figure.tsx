import type { LayoutPlan } from '@seamwright/takeoff';
import { useUnits } from '../../../lib/units';
import { Figure } from '../../../components/plan/figure';

/** Seams still inside the walkway: a warning, since seams there wear and lift first. */
export function WalkwayFigure({ plan }: { plan: LayoutPlan }) {
  const { length } = useUnits();
  const crossings = plan.trafficSeamCrossings;
  if (crossings.length === 0)
    return (
      <Figure isWide term="Seams in the walkway" note="The walkway is clear of seams">
        None
      </Figure>
    );
  const feet = crossings.reduce((sum, crossing) => sum + crossing.lengthFt, 0);
  return (
    <div className="col-span-2 my-2 rounded-md xl:col-span-1 border-2 border-caution-500 bg-caution-50 px-3 py-2 text-caution-800">
      <dt className="text-sm font-semibold">Seams in the walkway</dt>
      <dd className="font-semibold tabular-nums">
        {crossings.length} {crossings.length === 1 ? 'seam runs' : 'seams run'} {length(feet)}{' '}
        inside the walkway
      </dd>
      <dd className="text-sm">
        Seams under foot traffic wear and lift first; try another grain or move the path.
      </dd>
    </div>
  );
}
