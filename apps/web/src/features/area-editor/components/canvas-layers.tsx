import type { PointerEvent } from 'react';
import type { EdgeTag } from '@seamwright/takeoff';
import { useUnits } from '../../../lib/units';
import type { EditorDoc, EditorRing, LineRef, Pt } from '../model/types';
import { sameLine } from '../model/types';
import type { View } from '../model/view';

/** Yard feet (y north) to SVG units (y down): only the sign of y changes. */
export const svgY = (y: number) => -y;

function ringPath(points: readonly Pt[]): string {
  return points.length === 0 ? '' : `M${points.map(([x, y]) => `${x} ${svgY(y)}`).join('L')}Z`;
}

/** Side colours by what they meet; dashes tell them apart without colour too. */
export const tagStroke: Record<EdgeTag | 'none', { color: string; dash?: string }> = {
  none: { color: '#64748b', dash: '2 3' },
  hard: { color: '#1e293b' },
  bed: { color: '#8a5a14', dash: '8 3' },
  lawn: { color: '#356b47', dash: '8 3 2 3' },
  fence: { color: '#1e293b', dash: '1 2' },
  house: { color: '#a8321f' },
};

export function GridLayer({ view, height, step }: { view: View; height: number; step: number }) {
  const left = view.cx - view.widthFt / 2;
  const bottom = view.cy - height / 2;
  const xs: number[] = [];
  const ys: number[] = [];
  for (let x = Math.ceil(left / step) * step; x <= left + view.widthFt; x += step) xs.push(x);
  for (let y = Math.ceil(bottom / step) * step; y <= bottom + height; y += step) ys.push(y);
  const major = (value: number) => Math.abs(Math.round(value / step) % 5) === 0;
  return (
    <g aria-hidden="true">
      {xs.map((x) => (
        <line
          key={`x${x}`}
          x1={x}
          x2={x}
          y1={svgY(bottom)}
          y2={svgY(bottom + height)}
          stroke={major(x) ? '#c9c3b5' : '#e9e4d8'}
          strokeWidth={1}
          vectorEffect="non-scaling-stroke"
        />
      ))}
      {ys.map((y) => (
        <line
          key={`y${y}`}
          y1={svgY(y)}
          y2={svgY(y)}
          x1={left}
          x2={left + view.widthFt}
          stroke={major(y) ? '#c9c3b5' : '#e9e4d8'}
          strokeWidth={1}
          vectorEffect="non-scaling-stroke"
        />
      ))}
    </g>
  );
}

/** The turf: the outline filled, holes cut out (even-odd). */
/** `faint` when a photo is under it, so the photo shows through the turf. */
export function TurfLayer({ doc, faint = false }: { doc: EditorDoc; faint?: boolean }) {
  const d = [doc.outer, ...doc.holes]
    .filter((ring) => ring.points.length >= 3)
    .map((ring) => ringPath(ring.points))
    .join('');
  return (
    <path
      d={d}
      fill="#c9dcca"
      fillOpacity={faint ? 0.3 : 0.75}
      fillRule="evenodd"
      aria-hidden="true"
    />
  );
}

function RingSides({ ring, unit, label }: { ring: EditorRing; unit: number; label: boolean }) {
  const units = useUnits();
  const n = ring.points.length;
  if (n < 2) return null;
  return (
    <g>
      {ring.points.map((a, i) => {
        const b = ring.points[(i + 1) % n] as Pt;
        if (n === 2 && i === 1) return null;
        const style = tagStroke[ring.tags[i] ?? 'none'];
        const length = Math.hypot(b[0] - a[0], b[1] - a[1]);
        return (
          <g key={i}>
            <line
              x1={a[0]}
              y1={svgY(a[1])}
              x2={b[0]}
              y2={svgY(b[1])}
              stroke={style.color}
              strokeWidth={ring.curved[i] ? 4 : 2.5}
              strokeDasharray={style.dash}
              vectorEffect="non-scaling-stroke"
              data-side={i}
            />
            {label && length > unit * 3 ? (
              <text
                x={(a[0] + b[0]) / 2}
                y={svgY((a[1] + b[1]) / 2)}
                fontSize={unit * 1.1}
                textAnchor="middle"
                dominantBaseline="central"
                fill="#1e293b"
                stroke="#fbf8f1"
                strokeWidth={unit * 0.35}
                paintOrder="stroke"
              >
                {units.length(length)}
              </text>
            ) : null}
          </g>
        );
      })}
    </g>
  );
}

export function OutlineLayers({ doc, unit }: { doc: EditorDoc; unit: number }) {
  return (
    <g aria-hidden="true">
      <RingSides ring={doc.outer} unit={unit} label />
      {doc.holes.map((hole, i) => (
        <RingSides key={i} ring={hole} unit={unit} label={false} />
      ))}
      {doc.paths.map((path, i) =>
        path.points.length >= 2 ? (
          <g key={i}>
            <polyline
              points={path.points.map(([x, y]) => `${x},${svgY(y)}`).join(' ')}
              fill="none"
              stroke="#e8590c"
              strokeOpacity={0.35}
              strokeWidth={path.widthFt}
              strokeLinecap="butt"
              strokeLinejoin="round"
            />
            <polyline
              points={path.points.map(([x, y]) => `${x},${svgY(y)}`).join(' ')}
              fill="none"
              stroke="#9a3412"
              strokeWidth={1.5}
              strokeDasharray="6 4"
              vectorEffect="non-scaling-stroke"
            />
          </g>
        ) : null,
      )}
    </g>
  );
}

/** Every line's points; the active line's are big drag handles, the selected one ringed. */
export function HandlesLayer({
  doc,
  active,
  selected,
  unit,
  onGrab,
}: {
  doc: EditorDoc;
  active: LineRef;
  selected: number | null;
  unit: number;
  onGrab: (line: LineRef, index: number, event: PointerEvent) => void;
}) {
  const lines: { line: LineRef; points: readonly Pt[] }[] = [
    { line: { kind: 'outer' }, points: doc.outer.points },
    ...doc.holes.map((hole, index) => ({
      line: { kind: 'hole' as const, index },
      points: hole.points,
    })),
    ...doc.paths.map((path, index) => ({
      line: { kind: 'path' as const, index },
      points: path.points,
    })),
  ];
  return (
    <g>
      {lines.map(({ line, points }) => {
        const isActive = sameLine(line, active);
        return points.map(([x, y], i) => {
          const isSelected = isActive && selected === i;
          return (
            <circle
              key={`${line.kind}-${'index' in line ? line.index : 0}-${i}`}
              cx={x}
              cy={svgY(y)}
              r={unit * (isActive ? 0.9 : 0.5)}
              fill={isSelected ? '#1d4ed8' : isActive ? '#ffffff' : '#475569'}
              stroke={isActive ? '#1f3d2b' : 'none'}
              strokeWidth={2}
              vectorEffect="non-scaling-stroke"
              className="cursor-move"
              data-point={i}
              onPointerDown={(event) => onGrab(line, i, event)}
            />
          );
        });
      })}
    </g>
  );
}
