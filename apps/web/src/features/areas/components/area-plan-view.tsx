import type { ReactNode } from 'react';
import type { CautionView } from '@seamwright/shared';
import { CutSheetTable } from '../../../components/plan/cut-sheet-table';
import { PieceLegend } from '../../../components/plan/piece-legend';
import { PlanCautions } from '../../../components/plan/plan-cautions';
import { PlanDrawing } from '../../../components/plan/plan-drawing';
import type { Area } from '../api/area-types';
import { drawingRings, readSavedDrawing } from '../utils/saved-drawing';
import { AreaAlternatives } from './area-alternatives';
import { AreaFigures } from './area-figures';

function Section({
  id,
  title,
  intro,
  children,
}: {
  id: string;
  title: string;
  intro?: string;
  children: ReactNode;
}) {
  return (
    <section aria-labelledby={id} className="flex flex-col gap-3">
      <h2 id={id} className="text-xl font-bold">
        {title}
      </h2>
      {intro ? <p className="text-ink-muted print:hidden">{intro}</p> : null}
      {children}
    </section>
  );
}

/**
 * A saved area: the plan drawn (cuts tinted by piece, seams, grain, walkways, scale and north),
 * its numbers, the other ways to lay it side by side, the cut sheet and the cautions that
 * apply. Everything here prints; the app's navigation does not.
 */
export function AreaPlanView({ area, cautions }: { area: Area; cautions: readonly CautionView[] }) {
  const drawing = readSavedDrawing(area.request);
  const rings = drawing ? drawingRings(drawing) : [];
  const walkways = drawing?.trafficPaths ?? [];
  return (
    <div className="flex flex-col gap-8">
      <section aria-labelledby="area-plan-heading">
        <h2 id="area-plan-heading" className="sr-only">
          Plan
        </h2>
        <div className="grid gap-6 [print-color-adjust:exact] xl:grid-cols-[minmax(0,1fr)_15rem]">
          <figure className="flex min-w-0 flex-col gap-3 self-start rounded-lg border border-line bg-white p-3 print:border-0 print:p-0">
            <PlanDrawing plan={area.plan} rings={rings} walkways={walkways} />
            <figcaption>
              <PieceLegend plan={area.plan} hasWalkway={walkways.length > 0} />
            </figcaption>
          </figure>
          <AreaFigures area={area} />
        </div>
      </section>
      {area.alternatives.length > 1 ? (
        <Section
          id="area-alternatives-heading"
          title="Other ways to lay it"
          intro="The saved plan first, then the same area turned or on another roll width."
        >
          <AreaAlternatives alternatives={area.alternatives} rings={rings} walkways={walkways} />
        </Section>
      ) : null}
      <Section id="area-cut-sheet-heading" title="Cut sheet">
        <CutSheetTable entries={area.plan.cutSheet} />
      </Section>
      {cautions.length > 0 ? (
        <Section id="area-cautions-heading" title="Cautions">
          <PlanCautions cautions={cautions} />
        </Section>
      ) : null}
    </div>
  );
}
