import { useId } from 'react';
import type { LayoutPlan, LayoutPoint } from '@seamwright/takeoff';
import { cn } from '../ui/cn';
import { unitsFor, useUnits, type Units } from '../../lib/units';
import { drawingFrame, ringsPath } from './drawing-frame';
import { grainWords } from './plan-words';
import { CutShapes } from './cut-shapes';
import { ScaleAndNorth } from './scale-and-north';
import { SeamPaths } from './seam-paths';
import { WalkwayBand, WalkwayHatch } from './walkway-band';

/**
 * What the drawing reads of a plan: the planner's whole plan, or the fields an estimate keeps
 * of it (the customer's page gets only those).
 */
export type DrawablePlan = Pick<
  LayoutPlan,
  'pieces' | 'cuts' | 'seamLines' | 'grainAngleDeg' | 'areaSqFt' | 'orderedSqFt'
> & { seams: Pick<LayoutPlan['seams'], 'count'> };

interface PlanDrawingProps {
  plan: DrawablePlan;
  /** Outer ring first, then holes (feet). */
  rings: readonly (readonly LayoutPoint[])[];
  /** Walkways (traffic paths) as drawn, each at its width in feet. */
  walkways: readonly PlanWalkway[];
  /** Name of the drawing for screen readers ("Layout plan", "Plan: 12 ft roll"). */
  title?: string;
  /** Size limits of the drawing; the default suits a page's main plan. */
  className?: string;
  /** The units of the scale bar; signed-out pages (no session) pass the company's. */
  units?: Units;
}

/** A walkway to draw: the centre line and its width, both in feet. */
export interface PlanWalkway {
  points: readonly LayoutPoint[];
  widthFt: number;
}

/** One sentence a screen reader gives for the drawing; the figures beside it carry the numbers too. */
export function planSummary(plan: DrawablePlan, units: Units = unitsFor('imperial')): string {
  const pieces = plan.pieces.length === 1 ? '1 piece' : `${plan.pieces.length} pieces`;
  const seams = plan.seams.count === 1 ? '1 seam' : `${plan.seams.count} seams`;
  return (
    `Layout plan: ${units.area(plan.areaSqFt)} area covered by ${plan.cuts.length} cuts from ${pieces} ` +
    `of turf (${units.area(plan.orderedSqFt)} ordered), ${seams}, grain running ${grainWords(plan.grainAngleDeg)}.`
  );
}

/**
 * The plan in SVG, north up: the area outline (holes too), each cut tinted by its piece, side
 * seams dashed, butt seams dotted, grain arrows, the walkway hatched, a scale bar and a north arrow.
 */
export function PlanDrawing({
  plan,
  rings,
  walkways,
  title = 'Layout plan',
  className = 'max-h-[60vh] lg:max-h-[34rem] print:max-h-[18cm]',
  units: givenUnits,
}: PlanDrawingProps) {
  // useId's punctuation is not safe inside url(#…) references, so keep letters and digits only.
  const id = `plan${useId().replace(/[^a-zA-Z0-9]/g, '')}`;
  const sessionUnits = useUnits();
  const units = givenUnits ?? sessionUnits;
  const frame = drawingFrame(
    plan,
    rings,
    walkways.flatMap((walkway) => walkway.points),
  );
  const area = ringsPath(rings, frame.toSvg);
  return (
    <svg
      role="img"
      aria-labelledby={`${id}-title ${id}-desc`}
      viewBox={`0 0 ${frame.width.toFixed(3)} ${frame.height.toFixed(3)}`}
      className={cn('block h-auto w-full', className)}
      data-testid="plan-drawing"
    >
      <title id={`${id}-title`}>{title}</title>
      <desc id={`${id}-desc`}>{planSummary(plan, units)}</desc>
      <defs>
        <clipPath id={`${id}-area`}>
          <path d={area} clipRule="evenodd" />
        </clipPath>
        <WalkwayHatch id={`${id}-hatch`} unit={frame.unit} />
      </defs>
      <CutShapes plan={plan} frame={frame} areaClipId={`${id}-area`} />
      {walkways.map((walkway, index) => (
        <WalkwayBand
          key={index}
          points={walkway.points}
          widthFt={walkway.widthFt}
          frame={frame}
          hatchId={`${id}-hatch`}
        />
      ))}
      <SeamPaths seams={plan.seamLines} frame={frame} />
      <path
        d={area}
        fill="none"
        fillRule="evenodd"
        className="stroke-ink"
        strokeWidth={2.5}
        strokeLinejoin="round"
        vectorEffect="non-scaling-stroke"
      />
      <ScaleAndNorth frame={frame} units={units} />
    </svg>
  );
}
