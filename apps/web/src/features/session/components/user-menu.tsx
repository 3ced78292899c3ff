import { Link, useNavigate } from 'react-router-dom';
import { paths } from '../../../config/paths';
import { useSession } from '../../../lib/session';
import { useSignOut } from '../api/sign-out';

/** Who is signed in, and the way out. */
export function UserMenu({ tone = 'dark' }: { tone?: 'dark' | 'light' }) {
  const { user } = useSession();
  const navigate = useNavigate();
  const signOut = useSignOut(() => void navigate(paths.signIn()));
  return (
    <details className="relative">
      <summary
        className={`min-h-11 cursor-pointer list-none rounded px-2 py-2 font-semibold ${tone === 'dark' ? 'hover:bg-moss-800' : 'hover:bg-sand-100'}`}
      >
        <span className="sr-only">Account menu for </span>
        {user.name}
        <span aria-hidden="true" className="ml-1">
          ▾
        </span>
      </summary>
      <div
        className={`mt-1 rounded-md p-2 ${tone === 'dark' ? 'bg-moss-800' : 'absolute right-0 z-20 w-56 border border-line bg-white shadow-lg'}`}
      >
        <p
          className={`px-2 text-sm break-all ${tone === 'dark' ? 'text-sand-200' : 'text-ink-muted'}`}
        >
          {user.email}
        </p>
        <Link
          to={paths.profile}
          // The menu is a <details>; close it so it is not still open on the profile page.
          onClick={(event) => event.currentTarget.closest('details')?.removeAttribute('open')}
          className={`mt-1 flex min-h-11 w-full items-center rounded px-2 font-semibold no-underline ${tone === 'dark' ? 'text-white hover:bg-moss-700' : 'text-ink hover:bg-sand-100'}`}
        >
          Your profile
        </Link>
        <button
          type="button"
          onClick={() => signOut.mutate()}
          disabled={signOut.isPending}
          className={`mt-1 min-h-11 w-full rounded px-2 text-left font-semibold ${tone === 'dark' ? 'hover:bg-moss-700' : 'hover:bg-sand-100'}`}
        >
          Sign out
        </button>
      </div>
    </details>
  );
}
