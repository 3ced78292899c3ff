import { formatArea, formatNumber } from '@seamwright/takeoff';
import type { LayoutPlan } from '@seamwright/takeoff';
import { grainWords } from '../utils/plan-words';
import { Figure } from './figure';
import { PerimeterFigure } from './perimeter-figure';
import { WalkwayFigure } from './walkway-figure';

const ft = (value: number) => `${formatNumber(value, 1)} ft`;

/** The plan's numbers, each with its unit; the same numbers the drawing shows, in text. */
export function PlanFigures({ plan, hasWalkway }: { plan: LayoutPlan; hasWalkway: boolean }) {
  const across = plan.alternatives[0];
  const reuseSaving = plan.simpleStripOrderedSqFt - plan.orderedSqFt;
  return (
    <div role="group" aria-label="Plan figures">
      <dl className="grid grid-cols-2 gap-x-4 xl:grid-cols-1">
        <Figure term="Area">{formatArea(plan.areaSqFt)}</Figure>
        <Figure term="Turf ordered" note={formatArea(plan.orderedSqFt, { unit: 'sq yd' })}>
          {formatArea(plan.orderedSqFt)}
        </Figure>
        <Figure term="Waste" note={`${formatArea(plan.excessSqFt)} bought but trimmed off`}>
          {formatNumber(plan.wastePct, 1)} %
        </Figure>
        <Figure
          term="Pieces"
          note={`${formatNumber(plan.pieces[0]?.widthFt ?? 0)} ft wide, ${plan.cuts.length} cuts`}
        >
          {plan.pieces.length}
        </Figure>
        <Figure term="Seams" note={`side ${ft(plan.seams.sideFt)} · butt ${ft(plan.seams.buttFt)}`}>
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
              ? `Turned to run ${grainWords(across.grainAngleDeg)}, it would buy ${formatArea(across.orderedSqFt)} with ${across.seamCount} ${across.seamCount === 1 ? 'seam' : 'seams'}.`
              : undefined
          }
        >
          <span className="text-base font-normal">
            Strips without offcut reuse would buy {formatArea(plan.simpleStripOrderedSqFt)}
            {reuseSaving > 0 ? ` — reusing offcuts saves ${formatArea(reuseSaving)}.` : '.'}
          </span>
        </Figure>
      </dl>
    </div>
  );
}
