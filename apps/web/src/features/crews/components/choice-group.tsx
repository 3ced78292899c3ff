import type { ReactNode } from 'react';
import { useId } from 'react';
import { useBoundField } from '../../../components/ui/form/fields';

/**
 * A fieldset of checkboxes or radios bound to the surrounding Form by one name (the kit has no
 * group field): checkboxes give the list of checked values, radios the one chosen.
 */
export function ChoiceGroup({
  name,
  legend,
  type,
  options,
  hint,
}: {
  name: string;
  legend: string;
  type: 'checkbox' | 'radio';
  options: { value: string; label: string; swatch?: string }[];
  hint?: ReactNode;
}) {
  const id = useId();
  const { registration, error } = useBoundField(name);
  return (
    <fieldset
      className="flex flex-col gap-2"
      aria-describedby={error ? `${id}-error` : hint ? `${id}-hint` : undefined}
    >
      <legend className="mb-1 font-semibold">{legend}</legend>
      {hint ? (
        <p id={`${id}-hint`} className="text-sm text-ink-muted">
          {hint}
        </p>
      ) : null}
      <div className="flex flex-wrap gap-2">
        {options.map((option) => (
          <label
            key={option.value}
            className="flex min-h-11 items-center gap-2 rounded-md border border-line bg-white px-3"
          >
            <input
              type={type}
              value={option.value}
              className="h-5 w-5 accent-moss-700"
              aria-invalid={error ? true : undefined}
              {...registration}
            />
            {option.swatch ? (
              <span
                aria-hidden
                className="inline-block h-5 w-5 rounded"
                style={{ backgroundColor: option.swatch }}
              />
            ) : null}
            {option.label}
          </label>
        ))}
      </div>
      {error ? (
        <p id={`${id}-error`} role="alert" className="text-sm font-semibold text-brick-700">
          {error}
        </p>
      ) : null}
    </fieldset>
  );
}
