import type { LayoutPlan } from '@seamwright/takeoff';
import { cn } from '../ui/cn';
import { useUnits } from '../../lib/units';
import { pieceTint } from './piece-tints';
import { seamDash } from './seam-paths';

function LineSample({ dash }: { dash: string }) {
  return (
    <svg aria-hidden="true" viewBox="0 0 32 8" className="h-2 w-8 shrink-0">
      <line
        x1="2"
        y1="4"
        x2="30"
        y2="4"
        className="stroke-ink"
        strokeWidth="2.5"
        strokeDasharray={dash}
        strokeLinecap="round"
      />
    </svg>
  );
}

/** What the tints and lines of the drawing mean: one line per piece, then the line styles. */
export function PieceLegend({ plan, hasWalkway }: { plan: LayoutPlan; hasWalkway: boolean }) {
  const { length } = useUnits();
  return (
    <div className="text-sm">
      <h3 className="sr-only">Key to the drawing</h3>
      <ul className="flex flex-wrap gap-x-4 gap-y-1" aria-label="Pieces">
        {plan.pieces.map((piece, index) => (
          <li key={index} className="flex items-center gap-2 tabular-nums">
            <span
              aria-hidden="true"
              className={cn(
                'h-4 w-4 shrink-0 rounded-sm border border-line-strong',
                pieceTint(index).swatch,
              )}
            />
            Piece {index + 1} — {length(piece.widthFt)} × {length(piece.lengthFt)}
          </li>
        ))}
      </ul>
      <ul className="mt-2 flex flex-wrap gap-x-4 gap-y-1 text-ink-muted" aria-label="Lines">
        <li className="flex items-center gap-2">
          <LineSample dash={seamDash.side} />
          Side seam
        </li>
        <li className="flex items-center gap-2">
          <LineSample dash={seamDash.butt} />
          Butt seam
        </li>
        <li className="flex items-center gap-2">
          <span aria-hidden="true" className="font-bold text-ink">
            →
          </span>
          Grain (blades lean this way)
        </li>
        {hasWalkway ? (
          <li className="flex items-center gap-2">
            <span
              aria-hidden="true"
              className="h-3 w-6 shrink-0 border border-caution-800 bg-[repeating-linear-gradient(45deg,var(--color-caution-800)_0_2px,transparent_2px_6px)]"
            />
            Walkway
          </li>
        ) : null}
      </ul>
    </div>
  );
}
