import { useCallback, useEffect, useMemo, useState } from 'react';
import { useSearchParams } from 'react-router-dom';
import { useUnits } from '../../../lib/units';
import { buildLayoutRequest } from '../utils/build-request';
import { computePlanState, emptyPlanState, type PlanState } from '../utils/compute-plan';
import { parseLayoutParams, toLayoutSearchParams, type LayoutParams } from '../utils/layout-params';

/** Typing pauses this long before the plan is redrawn and the URL updated. */
export const PLAN_DEBOUNCE_MS = 150;

/**
 * The screen's state. What is typed lives in component state (so the caret never jumps) and is
 * copied into the URL, replacing the entry, once typing pauses; the URL is read once on
 * arrival, so a reload or a shared link shows the same plan. Field messages update on every
 * keystroke; the plan follows after the pause.
 */
export function useLayoutState() {
  const units = useUnits();
  const [searchParams, setSearchParams] = useSearchParams();
  const [params, setParams] = useState<LayoutParams>(() =>
    parseLayoutParams(searchParams, units.system),
  );
  const [planState, setPlanState] = useState<PlanState>(() =>
    computePlanState(params, emptyPlanState, units),
  );
  const fieldErrors = useMemo(() => buildLayoutRequest(params, units).errors, [params, units]);

  useEffect(() => {
    const timer = window.setTimeout(() => {
      setPlanState((previous) =>
        previous.good?.params === params && previous.good.units === units
          ? previous
          : computePlanState(params, previous, units),
      );
      const next = toLayoutSearchParams(params, units.system);
      if (next.toString() !== new URLSearchParams(window.location.search).toString())
        setSearchParams(next, { replace: true });
    }, PLAN_DEBOUNCE_MS);
    return () => window.clearTimeout(timer);
  }, [params, units, setSearchParams]);

  const update = useCallback(
    (change: Partial<LayoutParams>) => setParams((current) => ({ ...current, ...change })),
    [],
  );
  return { params, update, fieldErrors, planState, units };
}
