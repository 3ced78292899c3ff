import { createBrowserRouter, Outlet } from 'react-router-dom';
import { FocusOnNavigate } from '../components/ui/route-focus';
import { Loading } from '../components/ui/loading';
import { paths, publicPathPrefixes } from '../config/paths';
import { setCompanyAccessEndedHandler, setUnauthenticatedHandler } from '../lib/api-client';
import { queryClient } from '../lib/query-client';

/** Every page, signed in or not: focus follows navigation to the new page's heading. */
function RootLayout() {
  return (
    <>
      <FocusOnNavigate />
      <Outlet />
    </>
  );
}

/**
 * Every page is a lazy route, so the sign-in page loads only what it needs. Route modules
 * export `Component`, and where they need them `loader`, `ErrorBoundary`, `shouldRevalidate`.
 */
export const router = createBrowserRouter([
  {
    id: 'root',
    Component: RootLayout,
    HydrateFallback: () => <Loading />,
    children: [
      { path: '/sign-in', lazy: () => import('./routes/sign-in') },
      { path: '/sign-up', lazy: () => import('./routes/sign-up') },
      { path: '/forgot-password', lazy: () => import('./routes/forgot-password') },
      { path: '/reset-password/:token', lazy: () => import('./routes/reset-password') },
      { path: '/invitations/:token', lazy: () => import('./routes/invitation') },
      { path: '/e/:token', lazy: () => import('./routes/customer-estimate') },
      { path: '/i/:token', lazy: () => import('./routes/customer-invoice') },
      { path: '/choose-company', lazy: () => import('./routes/choose-company') },
      {
        id: 'app',
        lazy: () => import('./routes/app-layout'),
        children: [
          { index: true, lazy: () => import('./routes/today') },
          { path: '/customers', lazy: () => import('./routes/customers') },
          { path: '/customers/new', lazy: () => import('./routes/new-customer') },
          { path: '/customers/:customerId', lazy: () => import('./routes/customer') },
          { path: '/jobs', lazy: () => import('./routes/jobs') },
          { path: '/jobs/new', lazy: () => import('./routes/new-job') },
          { path: '/jobs/:jobId', lazy: () => import('./routes/job') },
          { path: '/jobs/:jobId/areas/new', lazy: () => import('./routes/new-area') },
          { path: '/areas/:areaId', lazy: () => import('./routes/area') },
          { path: '/areas/:areaId/edit', lazy: () => import('./routes/edit-area') },
          { path: '/estimates/:estimateId', lazy: () => import('./routes/estimate') },
          { path: '/invoices', lazy: () => import('./routes/invoices') },
          { path: '/invoices/:invoiceId', lazy: () => import('./routes/invoice') },
          { path: '/layout', lazy: () => import('./routes/layout-preview') },
          { path: '/stock', lazy: () => import('./routes/stock') },
          { path: '/stock/receive', lazy: () => import('./routes/stock-receive') },
          { path: '/stock/:rollId', lazy: () => import('./routes/stock-roll') },
          { path: '/calendar', lazy: () => import('./routes/calendar') },
          { path: '/reports', lazy: () => import('./routes/reports') },
          { path: '/settings', lazy: () => import('./routes/settings') },
          { path: '/settings/crews', lazy: () => import('./routes/crews') },
          { path: '/profile', lazy: () => import('./routes/profile') },
          { path: '*', lazy: () => import('./routes/not-found') },
        ],
      },
    ],
  },
]);

// A session that ends mid-use (expired, signed out in another tab): back to sign-in, then here.
setUnauthenticatedHandler(() => {
  const { pathname, search } = window.location;
  if (publicPathPrefixes.some((prefix) => pathname.startsWith(prefix))) return;
  if (router.state.navigation.state !== 'idle') return; // a loader is already redirecting
  queryClient.clear();
  void router.navigate(paths.signIn(`${pathname}${search}`), { replace: true });
});

// Removed from the active company while using it: nothing cached belongs to a company any more;
// the person picks one of the companies they still belong to.
setCompanyAccessEndedHandler(() => {
  if (window.location.pathname === paths.chooseCompany) return;
  if (router.state.navigation.state !== 'idle') return; // a loader is already redirecting
  queryClient.clear();
  void router.navigate(paths.chooseCompany, { replace: true });
});
