import type { EstimateLine } from '@seamwright/shared';
import { formatCents } from '../../../lib/money';
import { useUnits } from '../../../lib/units';
import { lineQuantityText, lineSourceLabels } from '../utils/estimate-words';

/**
 * Where a line came from: the takeoff rule (shown on demand, it can be long), or typed by hand;
 * a takeoff line changed by hand keeps its rule and the figures it replaced.
 */
export function LineSource({ line, currency }: { line: EstimateLine; currency: string }) {
  const units = useUnits();
  return (
    <div className="text-sm">
      <span className="font-semibold">{lineSourceLabels[line.source]}</span>
      {line.computed ? (
        <span className="block text-ink-muted">
          Takeoff said {lineQuantityText(units, line.computed.quantity, line.unit)} at{' '}
          {formatCents(line.computed.unitPriceCents, currency)}
        </span>
      ) : null}
      {line.rule ? (
        <details className="mt-1 text-ink-muted">
          <summary className="cursor-pointer text-moss-800">Rule</summary>
          <p className="mt-1 max-w-prose">{line.rule}</p>
        </details>
      ) : null}
    </div>
  );
}
