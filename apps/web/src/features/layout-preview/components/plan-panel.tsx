import { DEFAULT_WALKWAY_WIDTH_FT } from '@seamwright/takeoff';
import { PieceLegend } from '../../../components/plan/piece-legend';
import { PlanDrawing } from '../../../components/plan/plan-drawing';
import type { GoodPlan } from '../utils/compute-plan';
import { PlanFigures } from './plan-figures';

/** The drawing with its key, and the figures beside it (under it on a phone). */
export function PlanPanel({ good, isStale }: { good: GoodPlan; isStale: boolean }) {
  const hasWalkway = good.walkway !== null;
  return (
    // Only the graphics fade when stale: faded text would fail contrast, and the status line says why.
    <div
      className={isStale ? '[&_svg]:opacity-40 [&_svg]:grayscale [&_dd]:text-ink-muted' : undefined}
      data-stale={isStale || undefined}
    >
      {/* Exact colours in print, so the piece tints and the legend's swatches still match on paper. */}
      <div className="grid gap-6 [print-color-adjust:exact] xl:grid-cols-[minmax(0,1fr)_15rem]">
        <figure className="flex min-w-0 flex-col self-start gap-3 rounded-lg border border-line bg-white p-3 print:border-0 print:p-0">
          <PlanDrawing
            plan={good.plan}
            rings={good.rings}
            walkways={
              good.walkway ? [{ points: good.walkway, widthFt: DEFAULT_WALKWAY_WIDTH_FT }] : []
            }
          />
          <figcaption>
            <PieceLegend plan={good.plan} hasWalkway={hasWalkway} />
          </figcaption>
        </figure>
        <PlanFigures plan={good.plan} hasWalkway={hasWalkway} />
      </div>
    </div>
  );
}
