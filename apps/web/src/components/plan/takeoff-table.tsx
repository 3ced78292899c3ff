import type { TakeoffUnit } from '@seamwright/takeoff';
import { useUnits } from '../../lib/units';

/** What a takeoff table shows of a line: the planner's own lines and the job's API lines fit. */
export interface TakeoffTableLine {
  key: string;
  label: string;
  quantity: number;
  /** One of the takeoff package's units; the API's lines carry it as a string. */
  unit: string;
  rule: string;
  rounding?: string;
  warnings: readonly string[];
}

/**
 * The material takeoff: each line's quantity with its unit, and the rule in words with the
 * numbers put in, so every figure can be checked by hand.
 */
export function TakeoffTable({
  lines,
  caption = 'Material takeoff',
}: {
  lines: readonly TakeoffTableLine[];
  caption?: string;
}) {
  const units = useUnits();
  return (
    <div className="relative overflow-x-auto rounded-lg border border-line bg-white px-4">
      <table className="w-full border-collapse text-left">
        <caption className="sr-only">{caption}</caption>
        <thead>
          <tr className="border-b-2 border-line-strong text-sm text-ink-muted">
            <th scope="col" className="py-2 pr-3">
              Line and its rule
            </th>
            <th scope="col" className="py-2 text-right">
              Quantity
            </th>
          </tr>
        </thead>
        <tbody>
          {lines.map((line) => (
            <tr
              key={line.key}
              className="border-b border-line align-top break-inside-avoid last:border-0"
            >
              <th scope="row" className="py-2 pr-3 font-normal">
                <span className="font-semibold">{line.label}</span>
                <span className="block text-sm text-ink-muted tabular-nums">{line.rule}</span>
                {line.rounding && !line.rounding.startsWith('none') ? (
                  <span className="block text-sm text-ink-muted">Rounding: {line.rounding}</span>
                ) : null}
                {line.warnings.map((warning) => (
                  <span key={warning} className="mt-1 block text-sm font-semibold text-caution-800">
                    Check: {warning}
                  </span>
                ))}
              </th>
              <td className="py-2 text-right font-semibold tabular-nums whitespace-nowrap">
                {/* Lines are built by the takeoff package, so the unit is one of its units. */}
                {units.quantity(line.quantity, line.unit as TakeoffUnit)}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
