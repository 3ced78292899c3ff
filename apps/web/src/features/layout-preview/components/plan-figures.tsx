import { formatNumber } from '@seamwright/takeoff';
import type { LayoutPlan } from '@seamwright/takeoff';
import { useUnits } from '../../../lib/units';
import { grainWords } from '../../../components/plan/plan-words';
import { Figure } from '../../../components/plan/figure';
import { PerimeterFigure } from './perimeter-figure';
import { WalkwayFigure } from './walkway-figure';

/** The plan's numbers, each with its unit; the same numbers the drawing shows, in text. */
export function PlanFigures({ plan, hasWalkway }: { plan: LayoutPlan; hasWalkway: boolean }) {
  const units = useUnits();
  const { area, length } = units;
  const across = plan.alternatives[0];
  const reuseSaving = plan.simpleStripOrderedSqFt - plan.orderedSqFt;
  return (
    <div role="group" aria-label="Plan figures">
      <dl className="grid grid-cols-2 gap-x-4 xl:grid-cols-1">
        <Figure term="Area">{area(plan.areaSqFt)}</Figure>
        <Figure
          term="Turf ordered"
          // Imperial companies also price in sq yd; metric ones have one area unit.
          note={units.system === 'metric' ? undefined : area(plan.orderedSqFt, 'sq yd')}
        >
          {area(plan.orderedSqFt)}
        </Figure>
        <Figure term="Waste" note={`${area(plan.excessSqFt)} bought but trimmed off`}>
          {formatNumber(plan.wastePct, 1)} %
        </Figure>
        <Figure
          term="Pieces"
          note={`${length(plan.pieces[0]?.widthFt ?? 0)} wide, ${plan.cuts.length} cuts`}
        >
          {plan.pieces.length}
        </Figure>
        <Figure
          term="Seams"
          note={`side ${length(plan.seams.sideFt)} · butt ${length(plan.seams.buttFt)}`}
        >
          {plan.seams.count}
        </Figure>
        <PerimeterFigure plan={plan} />
        <Figure
          term="Grain"
          note={
            plan.grainSource === 'planner'
              ? 'Chosen for you: the direction that buys the least turf'
              : 'As you set it'
          }
        >
          runs {grainWords(plan.grainAngleDeg)}
        </Figure>
        {hasWalkway ? <WalkwayFigure plan={plan} /> : null}
        <Figure
          isWide
          term="Compared with simple strips"
          note={
            across && plan.grainSource === 'given'
              ? `Turned to run ${grainWords(across.grainAngleDeg)}, it would buy ${area(across.orderedSqFt)} with ${across.seamCount} ${across.seamCount === 1 ? 'seam' : 'seams'}.`
              : undefined
          }
        >
          <span className="text-base font-normal">
            Strips without offcut reuse would buy {area(plan.simpleStripOrderedSqFt)}
            {reuseSaving > 0 ? ` — reusing offcuts saves ${area(reuseSaving)}.` : '.'}
          </span>
        </Figure>
      </dl>
    </div>
  );
}
