import { useEffect, useId, useRef, type ReactNode } from 'react';
import { Button } from './button';

interface ConfirmDialogProps {
  isOpen: boolean;
  title: string;
  children: ReactNode;
  confirmLabel: string;
  isBusy?: boolean;
  onConfirm: () => void;
  onCancel: () => void;
  /**
   * Where focus goes when the button that opened the dialog is gone once it closes (the row it
   * belonged to was deleted): the list's heading or the next item.
   */
  fallbackFocus?: () => HTMLElement | null;
}

/**
 * Asks once before something destructive. A native modal <dialog>: it traps focus and Escape
 * cancels. Focus goes back to the button that opened it, which the browser does not do on its
 * own when React closes or removes the dialog; when that button is gone, to `fallbackFocus`.
 */
function returnFocus(
  opener: { current: HTMLElement | null },
  fallbackFocus: (() => HTMLElement | null) | undefined,
) {
  const target = opener.current;
  if (!target) return;
  opener.current = null;
  (target.isConnected ? target : fallbackFocus?.())?.focus();
}

export function ConfirmDialog({
  isOpen,
  title,
  children,
  confirmLabel,
  isBusy,
  onConfirm,
  onCancel,
  fallbackFocus,
}: ConfirmDialogProps) {
  const ref = useRef<HTMLDialogElement>(null);
  const titleId = useId();
  const opener = useRef<HTMLElement | null>(null);
  const fallback = useRef(fallbackFocus);
  useEffect(() => {
    fallback.current = fallbackFocus;
  });

  // Syncing with the browser's own dialog API is what effects are for (no data fetching).
  useEffect(() => {
    const dialog = ref.current;
    if (!dialog) return;
    if (isOpen && !dialog.open) {
      opener.current =
        document.activeElement instanceof HTMLElement ? document.activeElement : null;
      dialog.showModal?.();
    }
    if (!isOpen && dialog.open) {
      dialog.close();
      returnFocus(opener, fallback.current);
    }
  }, [isOpen]);

  // Unmounted while open (the item it asked about was deleted and its row went away).
  useEffect(() => () => returnFocus(opener, fallback.current), []);

  return (
    <dialog
      ref={ref}
      aria-labelledby={titleId}
      onCancel={(event) => {
        event.preventDefault();
        onCancel();
      }}
      className="m-auto w-[min(28rem,calc(100vw-2rem))] rounded-lg border border-line bg-white p-6 text-ink shadow-xl backdrop:bg-ink/40"
    >
      <h2 id={titleId} className="text-xl font-bold">
        {title}
      </h2>
      <div className="mt-3 text-ink-muted">{children}</div>
      <div className="mt-6 flex flex-wrap justify-end gap-2">
        <Button variant="secondary" onClick={onCancel} autoFocus>
          Keep it
        </Button>
        <Button variant="danger" onClick={onConfirm} isBusy={isBusy}>
          {confirmLabel}
        </Button>
      </div>
    </dialog>
  );
}
