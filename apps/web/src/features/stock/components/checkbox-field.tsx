import { useId } from 'react';
import { useBoundField } from '../../../components/ui/form/fields';

/**
 * A yes/no box bound to the surrounding Form by name, with its error (a server 409 such as
 * "Jobs hold 20 ft of this roll") under it. The kit has no checkbox yet.
 */
export function CheckboxField({
  name,
  label,
  hint,
}: {
  name: string;
  label: string;
  hint?: string;
}) {
  const id = useId();
  const { registration, error } = useBoundField(name);
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="flex min-h-11 items-center gap-2 font-semibold">
        <input
          id={id}
          type="checkbox"
          className="h-5 w-5 accent-moss-700"
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? `${id}-error` : hint ? `${id}-hint` : undefined}
          {...registration}
        />
        {label}
      </label>
      {hint && !error ? (
        <p id={`${id}-hint`} className="text-sm text-ink-muted">
          {hint}
        </p>
      ) : null}
      {error ? (
        <p id={`${id}-error`} role="alert" className="text-sm font-semibold text-brick-700">
          {error}
        </p>
      ) : null}
    </div>
  );
}
