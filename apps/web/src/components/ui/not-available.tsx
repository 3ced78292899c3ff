import { Link } from 'react-router-dom';
import { roleLabels, type Role } from '@seamwright/shared';
import { useDocumentTitle } from '../../lib/page-title';

/** Shown instead of a section the role may not open; the server refuses it as well. */
export function NotAvailable({
  section,
  role,
  homePath,
}: {
  section: string;
  role: Role;
  homePath: string;
}) {
  useDocumentTitle(`${section} not available`);
  return (
    <div role="alert" className="max-w-xl rounded-lg border border-line bg-white p-6">
      <h1 tabIndex={-1} className="text-2xl font-bold">
        {section} is not available for your role
      </h1>
      <p className="mt-2 text-ink-muted">
        You are signed in as {roleLabels[role].toLowerCase()}. If your work needs this section, ask
        the company owner to change your role.
      </p>
      <Link to={homePath} className="mt-4 inline-block min-h-11 py-2 font-semibold">
        Back to Today
      </Link>
    </div>
  );
}
