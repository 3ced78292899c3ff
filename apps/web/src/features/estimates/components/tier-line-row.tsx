import type { ReactNode } from 'react';
import type { EstimateLine } from '@seamwright/shared';
import { Button } from '../../../components/ui/button';
import { formatCents } from '../../../lib/money';
import { useUnits } from '../../../lib/units';
import { lineQuantityText } from '../utils/estimate-words';
import { LineCellInput } from './line-cell-input';
import { LineSource } from './line-source';

// On a phone a row is stacked (a small grid: the item across, then quantity and unit price,
// then the amount), so the table never needs the page to scroll sideways; from `sm` up it is
// an ordinary table row. The column headings are for screen readers there, so each figure
// carries a small visible word of its own.
export const rowClasses =
  'border-b border-line max-sm:grid max-sm:grid-cols-2 max-sm:gap-x-3 max-sm:gap-y-1 max-sm:py-2';
export const cellClasses = 'py-2 pr-3 max-sm:py-0';
const figure = `${cellClasses} sm:text-right tabular-nums whitespace-nowrap`;

function PhoneWord({ children }: { children: ReactNode }) {
  return (
    <span aria-hidden="true" className="block text-sm text-ink-muted sm:hidden">
      {children}
    </span>
  );
}

function RemoveButton({
  line,
  onRemove,
}: {
  line: EstimateLine;
  onRemove: (line: EstimateLine) => void;
}) {
  return (
    <Button
      variant="quietDanger"
      className="-ml-4 lg:ml-0"
      aria-label={`Remove ${line.label}`}
      onClick={() => onRemove(line)}
    >
      Remove
    </Button>
  );
}

/** One line of a tier; with `index` its quantity and unit price are the form's inputs. */
export function TierLineRow({
  line,
  currency,
  index,
  onRemove,
}: {
  line: EstimateLine;
  currency: string;
  /** The line's place in the form's field array, in edit mode. */
  index?: number;
  onRemove?: (line: EstimateLine) => void;
}) {
  const units = useUnits();
  const bound = index !== undefined;
  return (
    <tr className={`${rowClasses} ${bound ? 'sm:align-middle' : 'align-top'}`}>
      <th scope="row" className={`${cellClasses} font-normal max-sm:col-span-2`}>
        <span className="font-semibold">{line.label}</span>
        {line.taxable ? null : <span className="text-sm text-ink-muted"> (not taxed)</span>}
        {/* Below `lg` the source goes under the label (on a tablet Remove too), so the figures
            keep their room; on a phone Remove ends the stacked line. */}
        <span className="block lg:hidden">
          <LineSource line={line} currency={currency} />
        </span>
        {onRemove ? (
          <span className="hidden sm:max-lg:block">
            <RemoveButton line={line} onRemove={onRemove} />
          </span>
        ) : null}
      </th>
      <td className={figure}>
        <PhoneWord>Quantity</PhoneWord>
        {bound ? (
          <span className="inline-flex items-center gap-2">
            <LineCellInput name={`rows.${index}.quantity`} label={`Quantity of ${line.label}`} />
            <span className="w-10 text-left text-sm">{line.unit}</span>
          </span>
        ) : (
          lineQuantityText(units, line.quantity, line.unit)
        )}
      </td>
      <td className={figure}>
        <PhoneWord>Unit price</PhoneWord>
        {bound ? (
          <LineCellInput name={`rows.${index}.unitPrice`} label={`Unit price of ${line.label}`} />
        ) : (
          formatCents(line.unitPriceCents, currency)
        )}
      </td>
      <td className={`${figure} max-sm:flex max-sm:items-baseline max-sm:gap-2`}>
        <PhoneWord>Amount</PhoneWord>
        <span className="font-semibold sm:font-normal">
          {formatCents(line.amountCents, currency)}
        </span>
      </td>
      <td className={`${cellClasses} hidden lg:table-cell`}>
        <LineSource line={line} currency={currency} />
      </td>
      {onRemove ? (
        <td className="hidden py-2 max-sm:block max-sm:py-0 max-sm:text-right lg:table-cell">
          <RemoveButton line={line} onRemove={onRemove} />
        </td>
      ) : null}
    </tr>
  );
}
