import { ErrorCode } from '@seamwright/shared';
import { env } from '../config/env';
import { ApiError, networkError, toApiError } from './api-error';

export { ApiError } from './api-error';

type Method = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';
type QueryValue = string | number | boolean | null | undefined;

export interface RequestOptions {
  body?: unknown;
  query?: Record<string, QueryValue>;
  signal?: AbortSignal;
}

const unsafeMethods = new Set<Method>(['POST', 'PATCH', 'PUT', 'DELETE']);

let csrfToken: string | null = null;
let csrfPending: Promise<string> | null = null;
let onUnauthenticated: (() => void) | null = null;
let onCompanyAccessEnded: (() => void) | null = null;

/** Lets the router decide what a 401 means (go to sign-in with a return path). */
export function setUnauthenticatedHandler(handler: (() => void) | null): void {
  onUnauthenticated = handler;
}

/** Lets the router decide what 403 COMPANY_ACCESS_ENDED means (choose another company). */
export function setCompanyAccessEndedHandler(handler: (() => void) | null): void {
  onCompanyAccessEnded = handler;
}

async function loadCsrfToken(): Promise<string> {
  const response = await fetch(`${env.apiBaseUrl}/auth/csrf`, { credentials: 'include' }).catch(
    () => {
      throw networkError();
    },
  );
  if (!response.ok) throw await toApiError(response);
  const body = (await response.json()) as { data: { token: string } };
  csrfToken = body.data.token;
  return csrfToken;
}

function getCsrfToken(): Promise<string> {
  if (csrfToken) return Promise.resolve(csrfToken);
  csrfPending ??= loadCsrfToken().finally(() => {
    csrfPending = null;
  });
  return csrfPending;
}

/**
 * Forgets the CSRF token and fetches the new one. The session changes on sign-in, sign-up,
 * invitation acceptance, sign-out and company switch, and the server binds the token to it.
 */
export async function refreshCsrfToken(): Promise<void> {
  csrfToken = null;
  await getCsrfToken().catch(() => undefined);
}

function buildUrl(path: string, query?: Record<string, QueryValue>): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query ?? {})) {
    if (value !== undefined && value !== null && value !== '') params.set(key, String(value));
  }
  const search = params.toString();
  return `${env.apiBaseUrl}${path}${search ? `?${search}` : ''}`;
}

async function send(method: Method, path: string, options: RequestOptions): Promise<Response> {
  const headers: Record<string, string> = { accept: 'application/json' };
  if (options.body !== undefined) headers['content-type'] = 'application/json';
  if (unsafeMethods.has(method)) headers['x-csrf-token'] = await getCsrfToken();
  try {
    return await fetch(buildUrl(path, options.query), {
      method,
      headers,
      credentials: 'include',
      body: options.body === undefined ? undefined : JSON.stringify(options.body),
      signal: options.signal,
    });
  } catch (error) {
    if (error instanceof DOMException && error.name === 'AbortError') throw error;
    throw networkError();
  }
}

/**
 * The one way the app talks to the API. Answers the parsed JSON body (`{ data }` or
 * `{ data, meta }`), `undefined` for 204, and throws ApiError for everything else.
 */
export async function apiRequest<T>(
  method: Method,
  path: string,
  options: RequestOptions = {},
): Promise<T> {
  let response = await send(method, path, options);
  if (!response.ok) {
    let error = await toApiError(response);
    // A stale token (the session rotated in another tab): fetch a fresh one and retry once.
    if (error.status === 403 && error.code === ErrorCode.CsrfInvalid) {
      csrfToken = null;
      response = await send(method, path, options);
      if (response.ok) return readBody<T>(response);
      error = await toApiError(response);
    }
    if (error.status === 401 && error.code === ErrorCode.Unauthenticated) onUnauthenticated?.();
    if (error.status === 403 && error.code === ErrorCode.CompanyAccessEnded)
      onCompanyAccessEnded?.();
    throw error;
  }
  return readBody<T>(response);
}

async function readBody<T>(response: Response): Promise<T> {
  if (response.status === 204) return undefined as T;
  const text = await response.text();
  return (text ? JSON.parse(text) : undefined) as T;
}

export const api = {
  get: <T>(path: string, options?: RequestOptions) => apiRequest<T>('GET', path, options),
  post: <T>(path: string, body?: unknown) => apiRequest<T>('POST', path, { body }),
  patch: <T>(path: string, body: unknown) => apiRequest<T>('PATCH', path, { body }),
  put: <T>(path: string, body: unknown) => apiRequest<T>('PUT', path, { body }),
  delete: <T = void>(path: string) => apiRequest<T>('DELETE', path),
};

export function isApiError(error: unknown): error is ApiError {
  return error instanceof ApiError;
}
