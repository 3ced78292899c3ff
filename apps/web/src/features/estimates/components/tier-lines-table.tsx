import { useFieldArray, useFormContext } from 'react-hook-form';
import type { EstimateLine, EstimateTier } from '@seamwright/shared';
import { Form, SubmitButton } from '../../../components/ui/form';
import { lineRowsOf, lineRowsSchema, lineUpdatesOf, type LineRow } from '../utils/line-edits';
import { TierLineRow } from './tier-line-row';

const th = 'py-2 pr-3';

interface TableProps {
  tier: EstimateTier;
  currency: string;
  /** Given while the estimate is a draft the user may change. */
  edit?: {
    /** Answers the tier's lines as the server saved them. */
    onSave: (updates: ReturnType<typeof lineUpdatesOf>) => Promise<EstimateLine[]>;
    onRemove: (line: EstimateLine) => void;
  };
}

/** The rows; in edit mode `rowKeys` are the field array's keys, one per line in order. */
function LineRows({ tier, currency, edit, rowKeys }: TableProps & { rowKeys?: string[] }) {
  return (
    <tbody className="max-sm:block">
      {tier.lines.map((line, index) => (
        <TierLineRow
          key={rowKeys?.[index] ?? line.id}
          line={line}
          currency={currency}
          index={edit && rowKeys?.[index] !== undefined ? index : undefined}
          onRemove={edit?.onRemove}
        />
      ))}
    </tbody>
  );
}

/** The form's rows as a field array: each line's inputs are `rows.N.quantity` and `rows.N.unitPrice`. */
function EditableRows(props: TableProps) {
  const { control } = useFormContext<{ rows: LineRow[] }>();
  const { fields } = useFieldArray({ control, name: 'rows', keyName: 'key' });
  return <LineRows {...props} rowKeys={fields.map((field) => field.key)} />;
}

function LinesTable(props: TableProps) {
  return (
    <div className="relative overflow-x-auto rounded-lg border border-line bg-white px-4">
      <table className="w-full border-collapse text-left max-sm:block">
        <caption className="sr-only">Lines of {props.tier.name}</caption>
        <thead className="max-sm:sr-only">
          <tr className="border-b-2 border-line-strong text-sm text-ink-muted">
            <th scope="col" className={th}>
              Item
            </th>
            <th scope="col" className={`${th} text-right`}>
              Quantity
            </th>
            <th scope="col" className={`${th} text-right`}>
              Unit price
            </th>
            <th scope="col" className={`${th} text-right`}>
              Amount
            </th>
            <th scope="col" className={`${th} hidden lg:table-cell`}>
              Source
            </th>
            {props.edit ? (
              <th scope="col" className="hidden py-2 lg:table-cell">
                <span className="sr-only">Remove</span>
              </th>
            ) : null}
          </tr>
        </thead>
        {props.edit ? <EditableRows {...props} /> : <LineRows {...props} />}
      </table>
    </div>
  );
}

/**
 * A tier's lines: read-only, or (draft) with each line's quantity and unit price editable in
 * one form; saving sends only the changed lines, and the server prices them again.
 */
export function TierLinesTable(props: TableProps) {
  const { tier, edit } = props;
  if (tier.lines.length === 0) return <p>No lines in this option yet.</p>;
  if (!edit) return <LinesTable {...props} />;
  return (
    <Form
      schema={lineRowsSchema}
      defaultValues={{ rows: lineRowsOf(tier.lines) }}
      aria-label={`Lines of ${tier.name}`}
      // A new form when lines come or go; after a save the same form (focus stays on Save)
      // takes the server's figures.
      key={tier.lines.map((line) => line.id).join()}
      onSubmit={async (values, methods) => {
        const updates = lineUpdatesOf(tier.lines, values.rows);
        if (updates.length === 0) return;
        methods.reset({ rows: lineRowsOf(await edit.onSave(updates)) });
      }}
    >
      <LinesTable {...props} />
      <div>
        <SubmitButton busyLabel="Saving…">Save line changes</SubmitButton>
      </div>
    </Form>
  );
}
