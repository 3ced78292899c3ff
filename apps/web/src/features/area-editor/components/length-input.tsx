import { useId, useState } from 'react';
import { useUnits } from '../../../lib/units';
import { cn } from '../../../components/ui/cn';

// min-w: in the points table on a phone a box still shows a whole length (`40' 0"`).
const inputClasses =
  'block w-full min-w-[5.5rem] min-h-11 rounded-md border border-line-strong bg-white px-2 py-1 tabular-nums ' +
  'aria-[invalid=true]:border-brick-700 aria-[invalid=true]:bg-brick-50';

interface LengthInputProps {
  /** Accessible name, e.g. "Side 3 length". */
  label: string;
  /** The length now, in feet (null = empty). */
  feet: number | null;
  /** Called with feet when a readable length is committed (Enter or leaving the box). */
  onCommit: (feet: number) => void;
  /** Coordinates may be negative (west or south of the start); side lengths may not. */
  allowNegative?: boolean;
  /** Show the label above the box instead of only to screen readers. */
  showLabel?: boolean;
  className?: string;
}

/**
 * A length box for the editor's lists, read with the company's units (`27' 6"`, `27.5`, `8.4 m`).
 * It keeps what is typed until Enter or leaving the box, then commits; an unreadable length
 * stays in the box with the parser's message under it.
 */
export function LengthInput({
  label,
  feet,
  onCommit,
  allowNegative = false,
  showLabel = false,
  className,
}: LengthInputProps) {
  const units = useUnits();
  const id = useId();
  const shown = feet === null ? '' : (feet < 0 ? '−' : '') + units.length(Math.abs(feet));
  // What is being typed; null while the box just shows the current length.
  const [draft, setDraft] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  const text = draft ?? shown;

  const commit = () => {
    if (draft === null || draft === shown) {
      setDraft(null);
      return;
    }
    const negative = allowNegative && /^\s*[-−]/.test(draft);
    const read = units.parseLength(negative ? draft.replace(/^\s*[-−]/, '') : draft);
    if (!read.ok) {
      setError(read.error.message);
      return;
    }
    setError(null);
    setDraft(null);
    onCommit(negative ? -read.feet : read.feet);
  };

  return (
    <div className={cn('flex flex-col gap-1', className)}>
      <label htmlFor={id} className={showLabel ? 'text-sm font-semibold' : 'sr-only'}>
        {label}
      </label>
      <input
        id={id}
        className={inputClasses}
        value={text}
        inputMode="text"
        autoComplete="off"
        spellCheck={false}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${id}-error` : undefined}
        onChange={(event) => setDraft(event.target.value)}
        onBlur={commit}
        onKeyDown={(event) => {
          if (event.key === 'Enter') {
            event.preventDefault();
            commit();
          }
          if (event.key === 'Escape') {
            setDraft(null);
            setError(null);
          }
        }}
      />
      {error ? (
        <p id={`${id}-error`} className="text-sm font-semibold text-brick-700">
          {error}
        </p>
      ) : null}
    </div>
  );
}
