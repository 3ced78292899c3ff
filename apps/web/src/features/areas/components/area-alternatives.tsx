import { formatNumber } from '@seamwright/takeoff';
import type { LayoutPoint } from '@seamwright/takeoff';
import { PlanDrawing, type PlanWalkway } from '../../../components/plan/plan-drawing';
import { grainWords } from '../../../components/plan/plan-words';
import { cn } from '../../../components/ui/cn';
import { useUnits } from '../../../lib/units';
import type { AreaAlternative } from '../api/area-types';

interface AreaAlternativesProps {
  alternatives: readonly AreaAlternative[];
  rings: readonly (readonly LayoutPoint[])[];
  walkways: readonly PlanWalkway[];
}

function Row({ term, children }: { term: string; children: string }) {
  return (
    <div className="flex justify-between gap-3 border-b border-line py-1 last:border-0">
      <dt className="text-ink-muted">{term}</dt>
      <dd className="font-semibold tabular-nums">{children}</dd>
    </div>
  );
}

/**
 * The saved plan beside the other ways to lay the same area (the cheapest direction or a
 * quarter turn, the product's other roll widths), each with what it buys and its seams.
 */
export function AreaAlternatives({ alternatives, rings, walkways }: AreaAlternativesProps) {
  const units = useUnits();
  return (
    <ul className="grid gap-4 sm:grid-cols-2 xl:grid-cols-3" aria-label="Ways to lay it">
      {alternatives.map((alternative, index) => {
        const isChosen = alternative.kind === 'chosen';
        return (
          <li
            key={index}
            className={cn(
              'flex min-w-0 flex-col gap-2 rounded-lg border bg-white p-3 break-inside-avoid [print-color-adjust:exact]',
              isChosen ? 'border-2 border-moss-700' : 'border-line',
            )}
            data-testid="area-alternative"
          >
            <h3 className="font-bold">
              {alternative.label}
              {isChosen ? <span className="sr-only"> (the saved plan)</span> : null}
            </h3>
            <p className="text-sm text-ink-muted">
              {units.length(alternative.rollWidthFt)} roll, grain{' '}
              {grainWords(alternative.grainAngleDeg)}
              {!isChosen && alternative.sameAsChosen ? ' — the same as the saved plan' : ''}
            </p>
            <PlanDrawing
              plan={alternative.plan}
              rings={rings}
              walkways={walkways}
              title={`Plan: ${alternative.label}`}
              className="max-h-48"
            />
            <dl className="text-sm">
              <Row term="Turf ordered">{units.area(alternative.orderedSqFt)}</Row>
              <Row term="Waste">{`${formatNumber(alternative.wastePct, 1)} %`}</Row>
              <Row term="Seams">
                {`${alternative.seamCount} · ${units.length(alternative.seamFt)}`}
              </Row>
              <Row term="Seams in walkways">
                {alternative.walkwaySeamFt > 0 ? units.length(alternative.walkwaySeamFt) : 'None'}
              </Row>
            </dl>
          </li>
        );
      })}
    </ul>
  );
}
