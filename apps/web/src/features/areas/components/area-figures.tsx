import { formatNumber } from '@seamwright/takeoff';
import { Figure } from '../../../components/plan/figure';
import { grainWords } from '../../../components/plan/plan-words';
import { useUnits } from '../../../lib/units';
import type { Area } from '../api/area-types';
import { grainChoiceWords } from '../utils/area-words';

/** The saved plan's numbers beside the drawing, each with its unit. */
export function AreaFigures({ area }: { area: Area }) {
  const units = useUnits();
  const { plan } = area;
  const walkwaySeamFt = plan.trafficSeamCrossings.reduce((sum, c) => sum + c.lengthFt, 0);
  return (
    <div role="group" aria-label="Plan figures">
      <dl className="grid grid-cols-2 gap-x-4 xl:grid-cols-1">
        <Figure term="Area">{units.area(area.areaSqFt)}</Figure>
        <Figure
          term="Turf ordered"
          note={units.system === 'metric' ? undefined : units.area(plan.orderedSqFt, 'sq yd')}
        >
          {units.area(area.orderedSqFt)}
        </Figure>
        <Figure term="Waste" note={`${units.area(plan.excessSqFt)} bought but trimmed off`}>
          {formatNumber(area.wastePct, 1)} %
        </Figure>
        <Figure
          term="Pieces"
          note={`${units.length(plan.pieces[0]?.widthFt ?? 0)} roll, ${plan.cuts.length} cuts`}
        >
          {plan.pieces.length}
        </Figure>
        <Figure
          term="Seams"
          note={`side ${units.length(plan.seams.sideFt)} · butt ${units.length(plan.seams.buttFt)}`}
        >
          {plan.seams.count}
        </Figure>
        <Figure term="Grain" note={grainChoiceWords(area.grainChoice)}>
          runs {grainWords(plan.grainAngleDeg)}
        </Figure>
        {plan.trafficSeamCrossings.length > 0 ? (
          <Figure term="Seams in walkways" note="They wear and lift first under foot traffic">
            {units.length(walkwaySeamFt)}
          </Figure>
        ) : null}
        <Figure
          isWide
          term="Turf"
          note={
            area.baseDepthIn === null
              ? undefined
              : `Base ${units.length(area.baseDepthIn / 12)} deep`
          }
        >
          <span className="text-base">{area.turfProduct?.name ?? 'No product chosen'}</span>
        </Figure>
      </dl>
    </div>
  );
}
