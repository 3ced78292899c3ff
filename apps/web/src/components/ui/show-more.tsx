import { useCallback, useState } from 'react';
import { Button } from './button';

interface ShowMoreProps {
  shown: number;
  total: number;
  /** What the rows are, plural: "sites", "people". */
  noun: string;
  pageSize: number;
  hasMore: boolean;
  isLoading: boolean;
  onShowMore: () => void;
}

/**
 * Under a list read a page at a time: how many are shown of how many, and a way to see more.
 * Once the last page is in, the button goes; focus moves to the line that says all are shown
 * instead of falling back to the top of the page.
 */
export function ShowMore({
  shown,
  total,
  noun,
  pageSize,
  hasMore,
  isLoading,
  onShowMore,
}: ShowMoreProps) {
  const [wasUsed, setWasUsed] = useState(false);
  // Stable, so it focuses once when the line appears rather than on every render.
  const focusOnArrival = useCallback((node: HTMLElement | null) => node?.focus(), []);
  if (!hasMore) {
    if (!wasUsed) return null;
    return (
      <p
        ref={focusOnArrival}
        tabIndex={-1}
        className="mt-3 tabular-nums text-ink-muted print:hidden"
      >
        All {total.toLocaleString('en-US')} {noun} shown
      </p>
    );
  }
  const next = Math.min(pageSize, total - shown);
  return (
    <div className="mt-3 flex flex-wrap items-center gap-3 print:hidden">
      <p className="tabular-nums text-ink-muted">
        Showing {shown.toLocaleString('en-US')} of {total.toLocaleString('en-US')} {noun}
      </p>
      <Button
        variant="secondary"
        isBusy={isLoading}
        onClick={() => {
          setWasUsed(true);
          onShowMore();
        }}
      >
        Show {next.toLocaleString('en-US')} more
      </Button>
    </div>
  );
}
