import type { LayoutPoint } from '@seamwright/takeoff';
import type { DrawingFrame } from './drawing-frame';

interface GrainArrowProps {
  /** Where the arrow's middle sits, in plan feet. */
  at: LayoutPoint;
  angleDeg: number;
  lengthFt: number;
  frame: DrawingFrame;
}

/** A small arrow pointing the way the grain runs (the way the blades lean). */
export function GrainArrow({ at, angleDeg, lengthFt, frame }: GrainArrowProps) {
  const radians = (angleDeg * Math.PI) / 180;
  const [dx, dy] = [Math.cos(radians), Math.sin(radians)];
  const half = lengthFt / 2;
  const tail = frame.toSvg([at[0] - dx * half, at[1] - dy * half]);
  const tip = frame.toSvg([at[0] + dx * half, at[1] + dy * half]);
  const head = lengthFt * 0.35;
  const barb = (turn: number): LayoutPoint => {
    const angle = radians + Math.PI + turn;
    return frame.toSvg([
      at[0] + dx * half + Math.cos(angle) * head,
      at[1] + dy * half + Math.sin(angle) * head,
    ]);
  };
  const [left, right] = [barb(0.5), barb(-0.5)];
  return (
    <path
      d={`M${tail.join(' ')}L${tip.join(' ')}M${left.join(' ')}L${tip.join(' ')}L${right.join(' ')}`}
      className="stroke-ink"
      fill="none"
      strokeWidth={1.6}
      strokeLinecap="round"
      strokeLinejoin="round"
      vectorEffect="non-scaling-stroke"
    />
  );
}
