import { useId } from 'react';
import { useBoundField } from '../../../components/ui/form/fields';
import { cn } from '../../../components/ui/cn';

/**
 * A kit field for a table cell: bound to the Form by name like the kit's own fields, but with
 * its label for screen readers only (the column heading is the visible one).
 */
export function LineCellInput({
  name,
  label,
  className,
}: {
  name: string;
  label: string;
  className?: string;
}) {
  const { registration, error } = useBoundField(name);
  const errorId = `${useId()}-error`;
  return (
    <span className="inline-flex flex-col items-end gap-1">
      <input
        {...registration}
        aria-label={label}
        inputMode="decimal"
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? errorId : undefined}
        className={cn(
          'min-h-11 w-24 rounded-md border border-line-strong bg-white px-2 py-1 text-right tabular-nums',
          'aria-[invalid=true]:border-brick-700 aria-[invalid=true]:bg-brick-50',
          className,
        )}
      />
      {error ? (
        <span id={errorId} role="alert" className="text-sm font-semibold text-brick-700">
          {error}
        </span>
      ) : null}
    </span>
  );
}
