import type { Units } from '../../lib/units';
import type { DrawingFrame } from './drawing-frame';
import { scaleBarFeet, scaleBarMetres } from './drawing-frame';

/**
 * The footer of the drawing: a scale bar on the left (in feet, or metres for a metric company),
 * the north arrow on the right.
 */
export function ScaleAndNorth({ frame, units }: { frame: DrawingFrame; units: Units }) {
  const { unit, margin, width, height, footer } = frame;
  const metric = units.system === 'metric' ? scaleBarMetres(frame.planWidth) : null;
  const feet = metric ? metric.feet : scaleBarFeet(frame.planWidth);
  const label = metric ? `${metric.metres} m` : units.length(feet);
  const baseY = height - footer * 0.35;
  const tick = unit;
  const fontSize = unit * 1.9;
  const northX = width - margin - unit * 1.5;
  const northTop = height - footer + unit * 0.8;
  const northBottom = baseY;
  return (
    <g className="fill-ink stroke-ink">
      <path
        d={`M${margin} ${baseY - tick}V${baseY}H${margin + feet}V${baseY - tick}M${margin + feet / 2} ${baseY}v${-tick / 2}`}
        fill="none"
        strokeWidth={2}
        vectorEffect="non-scaling-stroke"
      />
      <text x={margin} y={baseY - tick - unit * 0.4} fontSize={fontSize} stroke="none">
        0
      </text>
      <text
        x={margin + feet}
        y={baseY - tick - unit * 0.4}
        fontSize={fontSize}
        textAnchor="end"
        stroke="none"
      >
        {label}
      </text>
      <path
        d={`M${northX} ${northBottom}V${northTop + unit * 2.2}M${northX - unit * 0.8} ${northTop + unit * 2.2}L${northX} ${northTop + unit * 0.6}L${northX + unit * 0.8} ${northTop + unit * 2.2}Z`}
        strokeWidth={2}
        strokeLinejoin="round"
        vectorEffect="non-scaling-stroke"
      />
      <text
        x={northX - unit * 1.2}
        y={northTop + unit * 1.6}
        fontSize={fontSize}
        textAnchor="end"
        stroke="none"
        className="font-bold"
      >
        N
      </text>
    </g>
  );
}
