// What every list page's route shares (customers, jobs, and the invoices and estimates to come):
// a loader that warms the page's query for the URL's parameters, revalidation only when the
// path changes, and a page with its header, a "New …" link for those who may write, and the
// not-available panel for roles that cannot read.
import type { ReactNode } from 'react';
import { Link, type LoaderFunctionArgs, type ShouldRevalidateFunctionArgs } from 'react-router-dom';
import type { Action } from '@seamwright/shared';
import type { EnsureQueryDataOptions, QueryKey } from '@tanstack/react-query';
import { buttonClasses } from '../../components/ui/button';
import { NotAvailable } from '../../components/ui/not-available';
import { PageHeader } from '../../components/ui/page-header';
import { paths } from '../../config/paths';
import { queryClient } from '../../lib/query-client';
import { useCan, useSession } from '../../lib/session';
import { sessionCan } from './guard';

/** A loader warming `queryOptions(parse(searchParams))`, skipped for roles that cannot read. */
export function listLoader<P, TData, TKey extends QueryKey>(
  readAction: Action,
  parse: (params: URLSearchParams) => P,
  queryOptions: (params: P) => EnsureQueryDataOptions<TData, Error, TData, TKey>,
) {
  return async ({ request }: LoaderFunctionArgs) => {
    if (!(await sessionCan(readAction))) return null;
    await queryClient.ensureQueryData(queryOptions(parse(new URL(request.url).searchParams)));
    return null;
  };
}

/** Search, filters, sort and paging change only the URL's query; the list's query follows. */
export function revalidateOnPathChange({
  currentUrl,
  nextUrl,
  defaultShouldRevalidate,
}: ShouldRevalidateFunctionArgs) {
  if (currentUrl.pathname === nextUrl.pathname) return false;
  return defaultShouldRevalidate;
}

interface ListPageProps {
  title: string;
  subtitle: string;
  readAction: Action;
  writeAction: Action;
  newPath: string;
  newLabel: string;
  children: ReactNode;
}

export function ListPage(props: ListPageProps) {
  const { role } = useSession();
  const canRead = useCan(props.readAction);
  const canWrite = useCan(props.writeAction);
  if (!canRead) return <NotAvailable section={props.title} role={role} homePath={paths.today} />;
  return (
    <>
      <PageHeader
        title={props.title}
        subtitle={props.subtitle}
        actions={
          canWrite ? (
            <Link to={props.newPath} className={buttonClasses('primary')}>
              {props.newLabel}
            </Link>
          ) : null
        }
      />
      {props.children}
    </>
  );
}
