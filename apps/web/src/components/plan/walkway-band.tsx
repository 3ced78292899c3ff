import type { LayoutPoint } from '@seamwright/takeoff';
import type { DrawingFrame } from './drawing-frame';

interface WalkwayBandProps {
  points: readonly LayoutPoint[];
  widthFt: number;
  frame: DrawingFrame;
  hatchId: string;
}

/** The hatch for walkways, defined once per drawing (lines every ~0.8 drawing units, at 45°). */
export function WalkwayHatch({ id, unit }: { id: string; unit: number }) {
  const size = unit * 0.8;
  return (
    <pattern
      id={id}
      patternUnits="userSpaceOnUse"
      width={size}
      height={size}
      patternTransform="rotate(45)"
    >
      <line
        x1={0}
        y1={0}
        x2={0}
        y2={size}
        className="stroke-caution-800"
        strokeWidth={size * 0.3}
      />
    </pattern>
  );
}

/** A walkway drawn at its width, hatched, so seams inside it stand out. */
export function WalkwayBand({ points, widthFt, frame, hatchId }: WalkwayBandProps) {
  const d = `M${points.map((point) => frame.toSvg(point).join(' ')).join('L')}`;
  return (
    <g data-walkway="">
      <path
        d={d}
        fill="none"
        className="stroke-caution-50"
        strokeWidth={widthFt}
        strokeLinejoin="round"
        opacity={0.75}
      />
      <path
        d={d}
        fill="none"
        stroke={`url(#${hatchId})`}
        strokeWidth={widthFt}
        strokeLinejoin="round"
      />
    </g>
  );
}
