import type { ReactNode } from 'react';
import { QueryClientProvider } from '@tanstack/react-query';
import { ToastProvider } from '../components/ui/toast';
import { RegionErrorBoundary } from '../components/ui/region-error';
import { queryClient } from '../lib/query-client';

/** App-wide providers: the query cache, toasts, and a last-resort error boundary. */
export function AppProvider({ children }: { children: ReactNode }) {
  return (
    <RegionErrorBoundary>
      <QueryClientProvider client={queryClient}>
        <ToastProvider>{children}</ToastProvider>
      </QueryClientProvider>
    </RegionErrorBoundary>
  );
}
