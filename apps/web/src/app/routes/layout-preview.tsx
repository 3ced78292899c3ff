import type { ShouldRevalidateFunctionArgs } from 'react-router-dom';
import { Button } from '../../components/ui/button';
import { PageHeader } from '../../components/ui/page-header';
import { LayoutPreview } from '../../features/layout-preview/components/layout-preview';
import { RouteError } from './route-error';

/** Typing rewrites only this page's query string; nothing needs reloading for it. */
export function shouldRevalidate({
  currentUrl,
  nextUrl,
  defaultShouldRevalidate,
}: ShouldRevalidateFunctionArgs) {
  if (currentUrl.pathname === nextUrl.pathname) return false;
  return defaultShouldRevalidate;
}

export function Component() {
  return (
    <>
      <PageHeader
        title="Layout"
        subtitle="Try a yard: how the turf is cut, what to order, and the materials it takes."
        actions={
          <Button variant="secondary" onClick={() => window.print()}>
            Print plan and cut sheet
          </Button>
        }
      />
      <LayoutPreview />
    </>
  );
}

export const ErrorBoundary = RouteError;
