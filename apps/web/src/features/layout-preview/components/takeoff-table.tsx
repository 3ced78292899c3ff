import type { TakeoffLine } from '@seamwright/takeoff';
import { useUnits } from '../../../lib/units';

/**
 * The material takeoff: each line's quantity with its unit, and the rule in words with the
 * numbers put in, so every figure can be checked by hand.
 */
export function TakeoffTable({ lines }: { lines: readonly TakeoffLine[] }) {
  const units = useUnits();
  return (
    <div className="overflow-x-auto">
      <table className="w-full border-collapse text-left">
        <caption className="sr-only">Material takeoff</caption>
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
            <tr key={line.key} className="border-b border-line align-top break-inside-avoid">
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
                {units.quantity(line.quantity, line.unit)}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
