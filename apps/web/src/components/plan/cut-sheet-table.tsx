import type { CutSheetCut, CutSheetEntry } from '@seamwright/takeoff';
import { cn } from '../ui/cn';
import { useUnits, type Units } from '../../lib/units';
import { pieceTint } from './piece-tints';

/** An arrow turned to the grain (degrees CCW from east), for the crew reading the sheet. */
function GrainGlyph({ angleDeg }: { angleDeg: number }) {
  return (
    <svg aria-hidden="true" viewBox="-10 -10 20 20" className="h-5 w-5 shrink-0">
      <g
        transform={`rotate(${-angleDeg})`}
        className="stroke-ink"
        fill="none"
        strokeWidth="2"
        strokeLinecap="round"
        strokeLinejoin="round"
      >
        <path d="M-7 0H7M3-4L7 0L3 4" />
      </g>
    </svg>
  );
}

/** Where a cut goes, with its distance from the edge in the company's units. */
function whereItGoes(cut: CutSheetCut, units: Units): string {
  const span = units.lengthRange(cut.fromEdgeStartFt, cut.fromEdgeEndFt);
  return `${cut.position}, ${span} from the ${cut.fromEdge} edge`;
}

/**
 * The cut sheet: each piece to cut off the roll, where its cuts go, and the way the grain runs.
 * Lengths read as the crew measures them: feet and inches (`20' 6"`), or metres when the
 * company works in metric.
 */
export function CutSheetTable({ entries }: { entries: readonly CutSheetEntry[] }) {
  const units = useUnits();
  return (
    <div className="relative overflow-x-auto">
      <table className="w-full border-collapse text-left">
        <caption className="sr-only">Cut sheet</caption>
        <thead>
          <tr className="border-b-2 border-line-strong text-sm text-ink-muted">
            <th scope="col" className="py-2 pr-3">
              Piece
            </th>
            <th scope="col" className="py-2 pr-3 text-right">
              Cut from the roll
            </th>
            <th scope="col" className="py-2 pr-3 text-right">
              Width
            </th>
            <th scope="col" className="py-2 pr-3">
              Where it goes
            </th>
            <th scope="col" className="py-2">
              Grain
            </th>
          </tr>
        </thead>
        <tbody>
          {entries.map((entry) => (
            <tr key={entry.piece} className="border-b border-line align-top break-inside-avoid">
              <th scope="row" className="py-2 pr-3 font-semibold whitespace-nowrap">
                <span
                  aria-hidden="true"
                  className={cn(
                    'mr-2 inline-block h-3 w-3 rounded-sm border border-line-strong [print-color-adjust:exact]',
                    pieceTint(entry.piece).swatch,
                  )}
                />
                {entry.piece + 1}
              </th>
              <td className="py-2 pr-3 text-right tabular-nums whitespace-nowrap">
                {units.length(entry.lengthFt)}
              </td>
              <td className="py-2 pr-3 text-right tabular-nums whitespace-nowrap">
                {units.length(entry.widthFt)}
              </td>
              <td className="py-2 pr-3 tabular-nums">
                {entry.cuts.length === 1 && entry.cuts[0] ? (
                  whereItGoes(entry.cuts[0], units)
                ) : (
                  <ul className="space-y-1">
                    {entry.cuts.map((cut) => (
                      <li key={cut.cut}>
                        {units.lengthRange(cut.acrossFromFt, cut.acrossToFt)} across ×{' '}
                        {units.lengthRange(cut.alongFromFt, cut.alongToFt)} along:{' '}
                        {whereItGoes(cut, units)}
                      </li>
                    ))}
                  </ul>
                )}
              </td>
              <td className="py-2">
                <span className="flex items-center gap-1 whitespace-nowrap">
                  <GrainGlyph angleDeg={entry.grainArrow.angleDeg} />
                  {entry.grainArrow.compass}
                </span>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
