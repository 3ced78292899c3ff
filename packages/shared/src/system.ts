/** `GET /api/health` (503 when the database is down). */
export interface HealthView {
  status: 'ok' | 'degraded';
  api: 'ok';
  database: 'ok' | 'down';
}

/**
 * `GET /api/auth/csrf`. Send `token` in the `x-csrf-token` header of every POST, PATCH, PUT and
 * DELETE. It stays valid across sign-in and sign-out; fetch a new one after a 403 CSRF_INVALID.
 */
export interface CsrfTokenView {
  token: string;
}

/** The header that carries the CSRF token. */
export const csrfHeaderName = 'x-csrf-token';
