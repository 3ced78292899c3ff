import type { JobTakeoffLineView } from '@seamwright/shared';
import type { TakeoffUnit } from '@seamwright/takeoff';
import { useUnits } from '../../../lib/units';

/**
 * The job's material takeoff: every area's lines added up, each with its quantity and unit and
 * the rule with the numbers put in, so a figure can be checked by hand.
 */
export function JobTakeoffTable({ lines }: { lines: readonly JobTakeoffLineView[] }) {
  const units = useUnits();
  return (
    <div className="relative overflow-x-auto rounded-lg border border-line bg-white px-4">
      <table className="w-full border-collapse text-left">
        <caption className="sr-only">Material takeoff for the whole job</caption>
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
            <tr key={line.key} className="border-b border-line align-top last:border-0">
              <th scope="row" className="py-2 pr-3 font-normal">
                <span className="font-semibold">{line.label}</span>
                <span className="block text-sm text-ink-muted tabular-nums">{line.rule}</span>
                {line.warnings.map((warning) => (
                  <span key={warning} className="mt-1 block text-sm font-semibold text-caution-800">
                    Check: {warning}
                  </span>
                ))}
              </th>
              <td className="py-2 text-right font-semibold tabular-nums whitespace-nowrap">
                {/* The server builds lines with the takeoff package, so the unit is one of its units. */}
                {units.quantity(line.quantity, line.unit as TakeoffUnit)}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
