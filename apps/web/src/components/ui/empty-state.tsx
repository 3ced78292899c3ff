import type { ReactNode } from 'react';

interface EmptyStateProps {
  title: string;
  children?: ReactNode;
  action?: ReactNode;
}

/** What an empty list or page shows: what is missing and what to do next. */
export function EmptyState({ title, children, action }: EmptyStateProps) {
  return (
    <div className="rounded-lg border border-dashed border-sand-300 bg-white px-6 py-10 text-center">
      <h2 className="text-lg font-semibold">{title}</h2>
      {children ? <div className="mx-auto mt-2 max-w-prose text-ink-muted">{children}</div> : null}
      {action ? <div className="mt-4 flex justify-center">{action}</div> : null}
    </div>
  );
}
