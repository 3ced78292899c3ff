import { createContext, use, useCallback, useMemo, useRef, useState, type ReactNode } from 'react';
import { ToastItem, type Toast, type ToastAction } from './toast-item';

interface ToastApi {
  show: (message: string, action?: ToastAction) => void;
}

const ToastContext = createContext<ToastApi | null>(null);

/**
 * Short messages at the bottom of the screen; an Undo action makes an archive reversible. Each
 * toast waits while the pointer is on it or focus is in it (WCAG 2.2.1), and whatever a toast
 * offers stays reachable on the page after it has gone (an archived customer shows Restore).
 */
export function ToastProvider({ children }: { children: ReactNode }) {
  const [toasts, setToasts] = useState<Toast[]>([]);
  const nextId = useRef(1);

  const dismiss = useCallback(
    (id: number) => setToasts((all) => all.filter((t) => t.id !== id)),
    [],
  );
  const show = useCallback((message: string, action?: ToastAction) => {
    const id = nextId.current++;
    setToasts((all) => [...all.slice(-2), { id, message, action }]);
  }, []);
  const api = useMemo(() => ({ show }), [show]);

  return (
    <ToastContext value={api}>
      {children}
      <div
        aria-live="polite"
        data-surface="dark"
        className="pointer-events-none fixed inset-x-0 bottom-20 z-50 flex flex-col items-center gap-2 px-4 md:bottom-6 print:hidden"
      >
        {toasts.map((toast) => (
          <ToastItem key={toast.id} toast={toast} onDismiss={dismiss} />
        ))}
      </div>
    </ToastContext>
  );
}

export function useToast(): ToastApi {
  const api = use(ToastContext);
  if (!api) throw new Error('useToast() needs a ToastProvider');
  return api;
}
