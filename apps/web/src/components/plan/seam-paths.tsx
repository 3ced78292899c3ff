import type { SeamLine } from '@seamwright/takeoff';
import type { DrawingFrame } from './drawing-frame';

/** Dash patterns (screen pixels): side seams dashed, butt seams dotted. */
export const seamDash = { side: '9 5', butt: '0.5 5' } as const;

/** The seams: side seams dashed along the grain, butt seams dotted across it. */
export function SeamPaths({ seams, frame }: { seams: readonly SeamLine[]; frame: DrawingFrame }) {
  return (
    <g>
      {seams.map((seam, index) => {
        const [x1, y1] = frame.toSvg(seam.from);
        const [x2, y2] = frame.toSvg(seam.to);
        return (
          <line
            key={index}
            data-seam={seam.kind}
            x1={x1}
            y1={y1}
            x2={x2}
            y2={y2}
            className="stroke-ink"
            strokeWidth={2.5}
            strokeDasharray={seamDash[seam.kind]}
            strokeLinecap="round"
            vectorEffect="non-scaling-stroke"
          />
        );
      })}
    </g>
  );
}
