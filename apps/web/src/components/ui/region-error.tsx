import { Component, type ErrorInfo, type ReactNode } from 'react';
import { ErrorCode } from '@seamwright/shared';
import { ApiError } from '../../lib/api-error';

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

/** The panel an error boundary shows in place of the region that failed. */
export function ErrorPanel({ error, onRetry }: { error: unknown; onRetry?: () => void }) {
  const { title, detail } = describeError(error);
  return (
    <div role="alert" className="rounded-lg border border-line bg-white p-6">
      <h2 className="text-lg font-bold">{title}</h2>
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
  onReset?: () => void;
}

/** Keeps one failing region (a list, a panel) from blanking the whole page. */
export class RegionErrorBoundary extends Component<BoundaryProps, { error: unknown }> {
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
            this.props.onReset?.();
            this.setState({ error: null });
          }}
        />
      );
    }
    return this.props.children;
  }
}
