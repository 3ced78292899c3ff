import type { ReactNode } from 'react';
import { cn } from '../ui/cn';

/** One figure beside the drawing: its name, the number with its unit, and an optional note. */
export function Figure({
  term,
  children,
  note,
  isWide = false,
}: {
  term: string;
  children: ReactNode;
  note?: ReactNode;
  isWide?: boolean;
}) {
  return (
    <div className={cn('border-b border-line py-2', isWide && 'col-span-2 xl:col-span-1')}>
      <dt className="text-sm font-semibold text-ink-muted">{term}</dt>
      <dd className="text-lg font-semibold tabular-nums">{children}</dd>
      {note ? <dd className="text-sm text-ink-muted tabular-nums">{note}</dd> : null}
    </div>
  );
}
