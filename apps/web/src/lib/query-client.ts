import { QueryClient } from '@tanstack/react-query';
import { ApiError } from './api-error';

/** Client errors (4xx) will not get better by asking again; network and 5xx get two retries. */
function shouldRetry(failureCount: number, error: unknown): boolean {
  if (error instanceof ApiError && error.status >= 400 && error.status < 500) return false;
  return failureCount < 2;
}

export const queryClient = new QueryClient({
  defaultOptions: {
    queries: { staleTime: 30_000, retry: shouldRetry, refetchOnWindowFocus: true },
    mutations: { retry: false },
  },
});

/**
 * The key of `GET /api/me`. It lives here rather than in the session feature because signing
 * in, signing up and accepting an invitation all answer with the new session and seed it.
 */
export const sessionMeKey = ['session', 'me'] as const;

/**
 * The key of `GET /api/crews`: the crews settings and the calendar both read it, and a change
 * on either must refresh the other.
 */
export const crewsKey = ['crews'] as const;
