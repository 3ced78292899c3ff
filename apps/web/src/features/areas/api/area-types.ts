import type { AreaAlternativeView, AreaView } from '@seamwright/shared';
import type { LayoutPlan } from '@seamwright/takeoff';

/** A saved area with the planner's own plan type, as this app draws it. */
export type Area = AreaView<LayoutPlan>;
export type AreaAlternative = AreaAlternativeView<LayoutPlan>;
