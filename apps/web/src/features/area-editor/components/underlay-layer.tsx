import { underlayPixelToFeet } from '@seamwright/shared';
import type { UnderlayDrawing } from '../model/underlay';
import { svgY } from './canvas-layers';

/**
 * The photo under the grid. Pixels are placed by `scale(feet per pixel)`, then turned
 * (`rotate` is clockwise on screen, the placement counter-clockwise in the yard) and moved so
 * the image's top-left corner sits at its offset.
 */
export function UnderlayImage({ drawing }: { drawing: UnderlayDrawing }) {
  const { placement } = drawing;
  const transform = `translate(${placement.offsetFt.x} ${svgY(placement.offsetFt.y)}) rotate(${-placement.rotationDeg}) scale(${placement.feetPerPixel})`;
  return (
    <image
      aria-hidden="true"
      data-testid="underlay-image"
      href={drawing.href}
      x={0}
      y={0}
      width={drawing.widthPx}
      height={drawing.heightPx}
      opacity={drawing.opacity}
      transform={transform}
      preserveAspectRatio="none"
      style={{ pointerEvents: 'none' }}
    />
  );
}

/** The two scale points on the photo, lettered A and B, with the line between them. */
export function UnderlayMarks({ drawing, unit }: { drawing: UnderlayDrawing; unit: number }) {
  const points = drawing.marks.map((p) => underlayPixelToFeet(drawing.placement, p));
  const [a, b] = points;
  return (
    <g aria-hidden="true" style={{ pointerEvents: 'none' }}>
      {a && b ? (
        <line
          x1={a.x}
          y1={svgY(a.y)}
          x2={b.x}
          y2={svgY(b.y)}
          stroke="#b45309"
          strokeWidth={2}
          strokeDasharray="6 3"
          vectorEffect="non-scaling-stroke"
        />
      ) : null}
      {points.map((p, i) => (
        <g key={i}>
          <circle
            cx={p.x}
            cy={svgY(p.y)}
            r={unit * 0.8}
            fill="#fff7ed"
            stroke="#b45309"
            strokeWidth={2}
            vectorEffect="non-scaling-stroke"
          />
          <text
            x={p.x + unit}
            y={svgY(p.y) - unit}
            fontSize={unit * 2}
            fontWeight={700}
            fill="#7c2d12"
          >
            {i === 0 ? 'A' : 'B'}
          </text>
        </g>
      ))}
    </g>
  );
}
