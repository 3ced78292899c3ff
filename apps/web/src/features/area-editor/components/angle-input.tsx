import { useId, useState } from 'react';
import { directionWords } from '../model/words';

/**
 * A side's direction in degrees counter-clockwise from east (0 east, 90 north), committed on
 * Enter or leaving the box; the compass word shows under it.
 */
export function AngleInput({
  label,
  angleDeg,
  onCommit,
}: {
  label: string;
  angleDeg: number;
  onCommit: (angleDeg: number) => void;
}) {
  const id = useId();
  const shown = String(Math.round(angleDeg * 10) / 10);
  const [draft, setDraft] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  const commit = () => {
    if (draft === null || draft === shown) {
      setDraft(null);
      return;
    }
    const value = Number(draft.replace('°', '').trim());
    if (draft.trim() === '' || !Number.isFinite(value)) {
      setError('Type degrees, such as 90 for north');
      return;
    }
    setError(null);
    setDraft(null);
    onCommit(((value % 360) + 360) % 360);
  };
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="sr-only">
        {label}
      </label>
      <input
        id={id}
        value={draft ?? shown}
        inputMode="decimal"
        autoComplete="off"
        className="block min-h-11 w-20 rounded-md border border-line-strong bg-white px-2 py-1 tabular-nums aria-[invalid=true]:border-brick-700 aria-[invalid=true]:bg-brick-50"
        aria-invalid={error ? true : undefined}
        aria-describedby={`${id}-words`}
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
      <span
        id={`${id}-words`}
        className={error ? 'text-sm font-semibold text-brick-700' : 'text-sm text-ink-muted'}
      >
        {error ?? directionWords(angleDeg)}
      </span>
    </div>
  );
}
