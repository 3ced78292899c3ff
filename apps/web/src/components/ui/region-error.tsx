import { Component, type ErrorInfo, type ReactNode } from 'react';
import { useQueryErrorResetBoundary } from '@tanstack/react-query';
import { ErrorCode } from '@seamwright/shared';
import { ApiError } from '../../lib/api-error';
import { useDocumentTitle } from '../../lib/page-title';

/** The words for an error, whatever threw it. */
export function describeError(error: unknown): { title: string; detail: string } {
  if (error instanceof ApiError) {
    if (error.code === ErrorCode.Forbidden) {
      return {
        title: 'Not available for your role',
        detail: 'Ask the company owner if you need access to this.',
      };
    }
    if (error.code === ErrorCode.NotFound) {
      return { title: 'Not found', detail: 'It may have been deleted, or the link is wrong.' };
    }
    return { title: 'Something went wrong', detail: error.detail };
  }
  return { title: 'Something went wrong', detail: 'Reload the page to try again.' };
}

interface ErrorPanelProps {
  error: unknown;
  onRetry?: () => void;
  /** The panel stands in for a whole page: its heading is the page's h1 and names the tab. */
  isPage?: boolean;
}

function PageTitle({ title }: { title: string }) {
  useDocumentTitle(title);
  return null;
}

/** The panel an error boundary shows in place of the region that failed. */
export function ErrorPanel({ error, onRetry, isPage = false }: ErrorPanelProps) {
  const { title, detail } = describeError(error);
  const Heading = isPage ? 'h1' : 'h2';
  return (
    <div role="alert" className="rounded-lg border border-line bg-white p-6">
      {isPage ? <PageTitle title={title} /> : null}
      <Heading tabIndex={isPage ? -1 : undefined} className="text-lg font-bold">
        {title}
      </Heading>
      <p className="mt-1 text-ink-muted">{detail}</p>
      {onRetry ? (
        <button
          type="button"
          className="mt-4 min-h-11 font-semibold text-moss-700 underline"
          onClick={onRetry}
        >
          Try again
        </button>
      ) : null}
    </div>
  );
}

interface BoundaryProps {
  children: ReactNode;
  onReset: () => void;
}

class Boundary extends Component<BoundaryProps, { error: unknown }> {
  override state: { error: unknown } = { error: null };

  static getDerivedStateFromError(error: unknown) {
    return { error };
  }

  override componentDidCatch(error: unknown, info: ErrorInfo) {
    console.error('Region failed', error, info.componentStack);
  }

  override render() {
    if (this.state.error) {
      return (
        <ErrorPanel
          error={this.state.error}
          onRetry={() => {
            this.props.onReset();
            this.setState({ error: null });
          }}
        />
      );
    }
    return this.props.children;
  }
}

/**
 * Keeps one failing region (a list, a panel) from blanking the whole page. "Try again" first
 * resets TanStack Query's error boundary state: without that, a suspense query that failed
 * throws its cached error again on the next render instead of fetching.
 */
export function RegionErrorBoundary({ children }: { children: ReactNode }) {
  const { reset } = useQueryErrorResetBoundary();
  return <Boundary onReset={reset}>{children}</Boundary>;
}
