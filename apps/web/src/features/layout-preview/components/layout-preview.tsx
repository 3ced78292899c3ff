import type { ReactNode } from 'react';
import { CutSheetTable } from '../../../components/plan/cut-sheet-table';
import { PlanCautions } from '../../../components/plan/plan-cautions';
import { EmptyState } from '../../../components/ui/empty-state';
import { useLayoutState } from '../hooks/use-layout-state';
import { EdgeFields } from './edge-fields';
import { PlanPanel } from './plan-panel';
import { RollFields } from './roll-fields';
import { ShapeFields } from './shape-fields';
import { TakeoffTable } from '../../../components/plan/takeoff-table';
import { WalkwayFields } from './walkway-fields';

function Section({
  id,
  title,
  intro,
  children,
}: {
  id: string;
  title: string;
  intro?: ReactNode;
  children: ReactNode;
}) {
  return (
    <section aria-labelledby={id} className="break-inside-avoid-page">
      <h2 id={id} className="text-xl font-bold">
        {title}
      </h2>
      {intro ? <p className="mt-1 text-ink-muted">{intro}</p> : null}
      <div className="mt-3">{children}</div>
    </section>
  );
}

/**
 * The layout screen: type a yard, see the plan drawn and counted, the cut sheet, the material
 * takeoff and the cautions. Everything is computed in the browser as you type.
 */
export function LayoutPreview() {
  const { params, update, fieldErrors, planState } = useLayoutState();
  const { good, plannerError } = planState;
  const hasFieldErrors = Object.keys(fieldErrors).length > 0;
  const isStale = plannerError !== null || hasFieldErrors;
  return (
    <div className="flex flex-col gap-8">
      <div className="grid gap-6 lg:grid-cols-[20rem_minmax(0,1fr)]">
        <section
          aria-labelledby="plan-heading"
          className="flex min-w-0 flex-col gap-3 lg:col-start-2 lg:row-start-1"
        >
          <h2 id="plan-heading" className="sr-only">
            Plan
          </h2>
          <div
            role="alert"
            className="empty:hidden rounded-md border border-brick-700 bg-brick-50 px-4 py-3 font-semibold text-brick-700"
          >
            {plannerError}
          </div>
          {isStale && good ? (
            <p role="status" className="text-sm font-semibold text-ink-muted">
              Showing the last plan that worked;{' '}
              {plannerError ? 'change the outline' : 'fix the marked fields'} to update it.
            </p>
          ) : null}
          {good ? (
            <PlanPanel good={good} isStale={isStale} />
          ) : (
            <EmptyState title="No plan yet">
              Fix the marked fields, and the plan appears here.
            </EmptyState>
          )}
        </section>
        <form
          aria-labelledby="yard-heading"
          className="flex min-w-0 flex-col gap-6 lg:col-start-1 lg:row-start-1 print:hidden"
          onSubmit={(event) => event.preventDefault()}
        >
          <h2 id="yard-heading" className="text-xl font-bold lg:sr-only">
            Yard and roll
          </h2>
          <ShapeFields params={params} errors={fieldErrors} update={update} />
          <EdgeFields params={params} update={update} />
          <RollFields params={params} errors={fieldErrors} update={update} />
          <WalkwayFields params={params} errors={fieldErrors} update={update} />
        </form>
      </div>
      {good ? (
        <>
          <Section id="cut-sheet-heading" title="Cut sheet">
            <CutSheetTable entries={good.plan.cutSheet} />
          </Section>
          <Section
            id="takeoff-heading"
            title="Material takeoff"
            intro="Using standard estimating defaults; your company’s own settings come later."
          >
            {good.takeoff ? (
              <TakeoffTable lines={good.takeoff.lines} />
            ) : (
              <p>The takeoff could not be worked out for this plan.</p>
            )}
          </Section>
          {good.takeoff ? (
            <Section id="cautions-heading" title="Cautions">
              <PlanCautions cautions={good.takeoff.cautions} />
            </Section>
          ) : null}
        </>
      ) : null}
    </div>
  );
}
