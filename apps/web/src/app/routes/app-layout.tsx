import { Outlet, redirect, type LoaderFunctionArgs } from 'react-router-dom';
import { ErrorCode } from '@seamwright/shared';
import { paths } from '../../config/paths';
import { ApiError } from '../../lib/api-error';
import { queryClient } from '../../lib/query-client';
import { SessionProvider } from '../../lib/session';
import { meQueryOptions, useMe } from '../../features/session/api/get-me';
import { AppShell } from '../../features/session/components/app-shell';
import { RouteError } from './route-error';

/** Every signed-in page needs the session; without one, go to sign-in and come back after. */
export async function loader({ request }: LoaderFunctionArgs) {
  try {
    await queryClient.ensureQueryData(meQueryOptions());
    return null;
  } catch (error) {
    if (error instanceof ApiError && error.code === ErrorCode.Unauthenticated) {
      const url = new URL(request.url);
      const next =
        url.pathname === paths.today && !url.search ? undefined : `${url.pathname}${url.search}`;
      return redirect(paths.signIn(next));
    }
    if (error instanceof ApiError && error.code === ErrorCode.CompanyAccessEnded) {
      return redirect(paths.chooseCompany);
    }
    throw error;
  }
}

export function Component() {
  const me = useMe();
  return (
    <SessionProvider me={me}>
      <AppShell>
        <Outlet />
      </AppShell>
    </SessionProvider>
  );
}

export const ErrorBoundary = RouteError;
