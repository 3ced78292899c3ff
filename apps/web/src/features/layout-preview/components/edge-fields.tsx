import { SelectField } from '../../../components/ui/form-fields';
import { edgeChoiceLabels, edgeChoices, type EdgeChoice } from '../utils/edge-tags';
import type { LayoutParams } from '../utils/layout-params';
import { lShapeEdges, rectangleEdges } from '../utils/shape-builders';

interface EdgeFieldsProps {
  params: LayoutParams;
  update: (change: Partial<LayoutParams>) => void;
}

const edgeOptions = edgeChoices.map((choice) => (
  <option key={choice} value={choice}>
    {edgeChoiceLabels[choice]}
  </option>
));

function EdgeSelect({
  label,
  value,
  hint,
  onValue,
}: {
  label: string;
  value: EdgeChoice;
  hint?: string;
  onValue: (value: EdgeChoice) => void;
}) {
  return (
    <SelectField
      label={label}
      hint={hint}
      value={value}
      // The options are exactly edgeChoices, so the selected value is one of them.
      onChange={(event) => onValue(event.target.value as EdgeChoice)}
    >
      {edgeOptions}
    </SelectField>
  );
}

/** Replaces one choice in a list, as a new list (the old one may be the shared default). */
function withChoice(list: readonly EdgeChoice[], index: number, choice: EdgeChoice) {
  return list.map((current, i) => (i === index ? choice : current));
}

/**
 * What each edge of the outline meets, which the perimeter figures and the takeoff's edging,
 * nails and pet boards follow. "Not sure" leaves an edge untagged.
 */
export function EdgeFields({ params, update }: EdgeFieldsProps) {
  return (
    <fieldset className="flex min-w-0 flex-col gap-3">
      <legend className="font-semibold">What does each edge meet?</legend>
      <p className="text-sm text-ink-muted">
        The perimeter figures and the takeoff’s edging, nails and boards follow these. “Not sure”
        leaves an edge for later.
      </p>
      {params.shape === 'points' ? (
        <EdgeSelect
          label="All edges meet"
          hint="Applies to every edge of the outline; the edges of holes stay untagged. Tagging each edge on its own comes with the full area editor."
          value={params.pedge}
          onValue={(pedge) => update({ pedge })}
        />
      ) : (
        <div className="grid grid-cols-1 gap-3 sm:grid-cols-2 lg:grid-cols-1">
          {(params.shape === 'rectangle' ? rectangleEdges : lShapeEdges).map((edge, i) => {
            const key = params.shape === 'rectangle' ? 'redges' : 'ledges';
            const list = params[key];
            return (
              <EdgeSelect
                key={edge.label}
                label={edge.label}
                value={list[i] ?? 'unknown'}
                onValue={(choice) => update({ [key]: withChoice(list, i, choice) })}
              />
            );
          })}
        </div>
      )}
    </fieldset>
  );
}
