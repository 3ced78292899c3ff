import type { ReactNode } from 'react';
import { useDocumentTitle } from '../../lib/page-title';

/**
 * The heading row of a page: its title, an optional line under it and the page's actions. It
 * also names the browser tab, and its h1 takes focus after navigation (see FocusOnNavigate).
 */
export function PageHeader({
  title,
  subtitle,
  actions,
}: {
  title: string;
  subtitle?: ReactNode;
  actions?: ReactNode;
}) {
  useDocumentTitle(title);
  return (
    <div className="mb-6 flex flex-wrap items-end justify-between gap-4">
      <div>
        <h1 tabIndex={-1} className="text-2xl font-bold text-ink sm:text-3xl">
          {title}
        </h1>
        {subtitle ? <p className="mt-1 text-ink-muted">{subtitle}</p> : null}
      </div>
      {actions ? <div className="flex flex-wrap gap-2 print:hidden">{actions}</div> : null}
    </div>
  );
}
