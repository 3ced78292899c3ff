import { Link } from 'react-router-dom';
import { paths } from '../../config/paths';
import { useDocumentTitle } from '../../lib/page-title';

export function Component() {
  useDocumentTitle('Page not found');
  return (
    <div className="max-w-xl rounded-lg border border-line bg-white p-6">
      <h1 tabIndex={-1} className="text-2xl font-bold">
        There is no page here
      </h1>
      <p className="mt-2 text-ink-muted">The link may be old or mistyped.</p>
      <Link to={paths.today} className="mt-4 inline-block min-h-11 py-2 font-semibold">
        Go to Today
      </Link>
    </div>
  );
}
