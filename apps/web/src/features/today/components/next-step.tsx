import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';

/** One suggested next step on Today: a short title that links, and a line on why. */
export function NextStep({
  to,
  title,
  children,
}: {
  to: string;
  title: string;
  children: ReactNode;
}) {
  return (
    <li className="rounded-lg border border-line bg-white p-4 hover:border-moss-600">
      <Link to={to} className="text-lg font-bold underline-offset-2 hover:underline">
        {title}
      </Link>
      <p className="mt-1 text-ink-muted">{children}</p>
    </li>
  );
}
