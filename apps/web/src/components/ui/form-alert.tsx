import type { ReactNode } from 'react';

/** A form-level message (the server said no); announced to screen readers when it appears. */
export function FormAlert({ children }: { children: ReactNode }) {
  if (!children) return null;
  return (
    <div
      role="alert"
      className="rounded-md border border-brick-700 bg-brick-50 px-4 py-3 font-semibold text-brick-700"
    >
      {children}
    </div>
  );
}

/** A quiet confirmation after something worked. */
export function FormNotice({ children }: { children: ReactNode }) {
  if (!children) return null;
  return (
    <div
      role="status"
      className="rounded-md border border-moss-200 bg-moss-50 px-4 py-3 text-moss-900"
    >
      {children}
    </div>
  );
}
