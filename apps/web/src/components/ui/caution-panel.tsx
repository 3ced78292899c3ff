import type { ReactNode } from 'react';

const defaultDeferral =
  'This is a reminder, not advice for your site. Follow your local codes and the practice of licensed professionals where you work.';

interface CautionPanelProps {
  title: string;
  children: ReactNode;
  /** The closing pointer to local codes and licensed practice, when the caution brings its own. */
  deferral?: string;
}

/**
 * The one way Seamwright shows a caution where the work can hurt someone. Every panel ends
 * with the same pointer to local codes and licensed practice, so no caution reads as the
 * final word.
 */
export function CautionPanel({ title, children, deferral = defaultDeferral }: CautionPanelProps) {
  return (
    <aside
      aria-label={`Caution: ${title}`}
      className="rounded-lg border-2 border-caution-500 bg-caution-50 p-4 text-ink print:border-black"
    >
      <h2 className="flex items-center gap-2 text-lg font-bold text-caution-800">
        <svg
          aria-hidden="true"
          viewBox="0 0 24 24"
          className="h-6 w-6 shrink-0"
          fill="none"
          stroke="currentColor"
          strokeWidth="2"
        >
          <path d="M12 3 2 21h20L12 3Z" strokeLinejoin="round" />
          <path d="M12 10v5M12 18v.5" strokeLinecap="round" />
        </svg>
        {title}
      </h2>
      <div className="mt-2 space-y-2">{children}</div>
      <p className="mt-3 text-sm text-ink-muted">{deferral}</p>
    </aside>
  );
}
