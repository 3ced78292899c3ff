import type { LayoutPoint } from '@seamwright/takeoff';
import type { DrawingFrame } from './drawing-frame';
import type { DrawablePlan } from './plan-drawing';
import { pieceTint } from './piece-tints';
import { GrainArrow } from './grain-arrow';

interface CutShapesProps {
  plan: DrawablePlan;
  frame: DrawingFrame;
  /** id of the clip path holding the area, so the laid turf shows inside the outline. */
  areaClipId: string;
}

function lerp(a: LayoutPoint, b: LayoutPoint, t: number): LayoutPoint {
  return [a[0] + (b[0] - a[0]) * t, a[1] + (b[1] - a[1]) * t];
}

/**
 * Each cut, tinted by the piece it comes from: strong inside the area, faint where the
 * rectangle runs past the edge (turf trimmed off on site). Labelled with the piece number and
 * carrying grain arrows.
 */
export function CutShapes({ plan, frame, areaClipId }: CutShapesProps) {
  const { unit } = frame;
  return (
    <g>
      {plan.cuts.map((cut, index) => {
        const points = cut.corners.map((corner) => frame.toSvg(corner).join(',')).join(' ');
        const tint = pieceTint(cut.piece).fill;
        return (
          <g key={index} data-cut={index} data-piece={cut.piece + 1}>
            <polygon points={points} className={tint} opacity={0.35} />
            <polygon points={points} className={tint} clipPath={`url(#${areaClipId})`} />
            <polygon
              points={points}
              fill="none"
              className="stroke-ink-muted"
              strokeWidth={0.75}
              vectorEffect="non-scaling-stroke"
            />
          </g>
        );
      })}
      {plan.cuts.map((cut, index) => {
        const [startLeft, startRight, endRight, endLeft] = cut.corners;
        const start = lerp(startLeft, startRight, 0.5);
        const end = lerp(endLeft, endRight, 0.5);
        const arrowFt = Math.min(unit * 2.4, cut.alongFt * 0.22, cut.acrossFt * 0.6);
        const [labelX, labelY] = frame.toSvg(lerp(start, end, 0.5));
        return (
          <g key={index}>
            <GrainArrow
              at={lerp(start, end, 0.18)}
              angleDeg={plan.grainAngleDeg}
              lengthFt={arrowFt}
              frame={frame}
            />
            <GrainArrow
              at={lerp(start, end, 0.82)}
              angleDeg={plan.grainAngleDeg}
              lengthFt={arrowFt}
              frame={frame}
            />
            <text
              x={labelX}
              y={labelY}
              fontSize={Math.min(unit * 2, cut.acrossFt * 0.6)}
              textAnchor="middle"
              dominantBaseline="central"
              className="fill-ink font-bold"
              stroke="white"
              strokeWidth={unit * 0.25}
              paintOrder="stroke"
            >
              {cut.piece + 1}
            </text>
          </g>
        );
      })}
    </g>
  );
}
