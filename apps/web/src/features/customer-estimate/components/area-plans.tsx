import type { PublicEstimateArea } from '@seamwright/shared';
import { PlanDrawing } from '../../../components/plan/plan-drawing';
import { unitsFor } from '../../../lib/units';
import { areaDrawingOf } from '../utils/area-drawing';

/** Each area's drawing: the outline, where the turf pieces go and where the seams run. */
export function AreaPlans({
  areas,
  units,
}: {
  areas: readonly PublicEstimateArea[];
  units: 'imperial' | 'metric';
}) {
  if (areas.length === 0) return null;
  const words = unitsFor(units);
  return (
    <section aria-labelledby="plans-heading" className="flex flex-col gap-4">
      <h2 id="plans-heading" className="text-2xl font-bold">
        The plan
      </h2>
      <p className="text-ink-muted">
        Seen from above, north at the top. Dashed and dotted lines are where pieces of turf are
        joined.
      </p>
      {areas.map((area, index) => {
        const drawing = areaDrawingOf(area);
        return (
          <figure key={index} className="rounded-lg border border-line bg-white p-4">
            <figcaption className="mb-2 text-lg font-semibold">
              {area.name}: {words.area(area.areaSqFt)}
            </figcaption>
            {drawing ? (
              <PlanDrawing
                plan={drawing.plan}
                rings={drawing.rings}
                walkways={drawing.walkways}
                title={`Plan of ${area.name}`}
                units={words}
                className="max-h-[70vh] lg:max-h-[30rem]"
              />
            ) : null}
          </figure>
        );
      })}
    </section>
  );
}
