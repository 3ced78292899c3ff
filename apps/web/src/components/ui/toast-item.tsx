import { useEffect, useRef, useState, type FocusEvent } from 'react';

export interface ToastAction {
  label: string;
  onClick: () => void;
}

export interface Toast {
  id: number;
  message: string;
  action?: ToastAction;
}

export const toastLifetimeMs = 8000;

/**
 * One toast. Its clock runs only while nobody is reading or using it: hovering or focusing it
 * pauses the countdown, and leaving resumes it with the time that was left.
 */
export function ToastItem({ toast, onDismiss }: { toast: Toast; onDismiss: (id: number) => void }) {
  const [isHovered, setIsHovered] = useState(false);
  const [hasFocus, setHasFocus] = useState(false);
  const remainingMs = useRef(toastLifetimeMs);
  const isPaused = isHovered || hasFocus;
  const { id } = toast;

  // A timer is a browser resource to keep in step with the paused state: an effect's job.
  useEffect(() => {
    if (isPaused) return;
    const startedAt = Date.now();
    const timer = window.setTimeout(() => onDismiss(id), remainingMs.current);
    return () => {
      window.clearTimeout(timer);
      remainingMs.current = Math.max(0, remainingMs.current - (Date.now() - startedAt));
    };
  }, [isPaused, id, onDismiss]);

  const onBlur = (event: FocusEvent<HTMLDivElement>) => {
    if (!event.currentTarget.contains(event.relatedTarget)) setHasFocus(false);
  };

  return (
    <div
      role="status"
      onMouseEnter={() => setIsHovered(true)}
      onMouseLeave={() => setIsHovered(false)}
      onFocus={() => setHasFocus(true)}
      onBlur={onBlur}
      className="pointer-events-auto flex max-w-md items-center gap-4 rounded-md bg-moss-900 px-4 py-3 text-white shadow-lg"
    >
      <span>{toast.message}</span>
      {toast.action ? (
        <button
          type="button"
          className="min-h-11 rounded px-3 font-bold text-sand-200 underline"
          onClick={() => {
            toast.action?.onClick();
            onDismiss(id);
          }}
        >
          {toast.action.label}
        </button>
      ) : null}
      <button
        type="button"
        aria-label="Dismiss"
        className="min-h-11 min-w-11 rounded text-sand-200"
        onClick={() => onDismiss(id)}
      >
        ×
      </button>
    </div>
  );
}
