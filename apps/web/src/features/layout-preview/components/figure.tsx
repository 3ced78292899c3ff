import type { ReactNode } from 'react';

/** One figure beside the drawing: its name, the number with its unit, and an optional note. */
export function Figure({ term, children, note }: { term: string; children: ReactNode; note?: ReactNode }) {
  return (
    <div className="border-b border-line py-2 last:border-b-0">
      <dt className="text-sm font-semibold text-ink-muted">{term}</dt>
      <dd className="text-lg font-semibold tabular-nums">{children}</dd>
      {note ? <dd className="text-sm text-ink-muted tabular-nums">{note}</dd> : null}
    </div>
  );
}
