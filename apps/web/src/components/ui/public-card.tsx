import type { ReactNode } from 'react';
import { useDocumentTitle } from '../../lib/page-title';

/** The frame of the signed-out pages: the name, one card, and a line under it. */
export function PublicCard({
  title,
  intro,
  children,
  footer,
}: {
  title: string;
  intro?: ReactNode;
  children: ReactNode;
  footer?: ReactNode;
}) {
  useDocumentTitle(title);
  return (
    <div className="flex min-h-dvh flex-col items-center bg-sand-100 px-4 py-10">
      <p className="mb-6 flex items-center gap-2 text-2xl font-bold text-moss-800">
        <svg aria-hidden="true" viewBox="0 0 32 32" className="h-8 w-8">
          <rect x="2" y="2" width="28" height="28" rx="6" fill="currentColor" />
          <path
            d="M9 22c2-6 3-9 4-12M15 22c1-5 2-8 2-11M21 22c0-4 1-7 2-9"
            stroke="#f4ecdc"
            strokeWidth="2.2"
            strokeLinecap="round"
            fill="none"
          />
        </svg>
        Seamwright
      </p>
      <main className="w-full max-w-md rounded-xl border border-line bg-white p-6 shadow-sm sm:p-8">
        <h1 tabIndex={-1} className="text-2xl font-bold">
          {title}
        </h1>
        {intro ? <div className="mt-2 text-ink-muted">{intro}</div> : null}
        <div className="mt-6">{children}</div>
      </main>
      {footer ? <div className="mt-6 text-center">{footer}</div> : null}
    </div>
  );
}
