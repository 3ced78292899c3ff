// One-time tokens (password reset, invitations) travel in URL paths, and a log line that
// kept them would be a working link for anyone who reads the logs. The request logger writes
// URLs only through `redactUrl`, which replaces:
// - the `:token` segment of every route declared with one (derived from the RouteTable, so a
//   new token route is covered without touching this file);
// - any other long, random-looking path segment (a token sent to a mistyped route);
// - the value of query parameters whose name says token, secret or password.

export const redacted = '[redacted]';

/** A route's path split into segments; `null` marks the segment that holds a token. */
export type TokenRoutePattern = readonly (string | null)[];

/** The patterns of routes with a `:token` parameter, e.g. `/api/invitations/:token/accept`. */
export function tokenRoutePatterns(paths: readonly string[]): TokenRoutePattern[] {
  return paths
    .filter((path) => path.split('/').includes(':token'))
    .map((path) =>
      segmentsOf(path).map((segment) => (segment === ':token' ? null : segment.toLowerCase())),
    );
}

const uuid = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
/** 32 random bytes in base64url are 43 characters; ids are UUIDs and stay readable. */
const randomLooking = /^[A-Za-z0-9_%.~+=-]{24,}$/;
const secretParam = /token|secret|password/i;

function segmentsOf(path: string): string[] {
  // Express matches with or without one trailing slash; drop it so both shapes compare equal.
  return path.replace(/\/$/, '').split('/');
}

function safeDecode(value: string): string {
  try {
    return decodeURIComponent(value);
  } catch {
    return value;
  }
}

function matches(pattern: TokenRoutePattern, segments: readonly string[]): boolean {
  if (pattern.length !== segments.length) return false;
  return pattern.every((literal, i) => {
    if (literal === null) return true;
    // A `:param` segment matches anything; literals compare like Express (case-insensitive).
    return literal.startsWith(':') || literal === safeDecode(segments[i] ?? '').toLowerCase();
  });
}

function redactPath(path: string, patterns: readonly TokenRoutePattern[]): string {
  const segments = segmentsOf(path);
  const route = patterns.find((pattern) => matches(pattern, segments));
  const out = segments.map((segment, i) => {
    if (route?.[i] === null) return redacted;
    return randomLooking.test(segment) && !uuid.test(segment) ? redacted : segment;
  });
  const joined = out.join('/');
  return path.endsWith('/') ? `${joined}/` : joined;
}

function redactQuery(query: string): string {
  return query
    .split('&')
    .map((pair) => {
      const index = pair.indexOf('=');
      const name = index === -1 ? pair : pair.slice(0, index);
      return secretParam.test(safeDecode(name.replace(/\+/g, ' '))) ? `${name}=${redacted}` : pair;
    })
    .join('&');
}

/** The URL as it may appear in a log line. Never throws, whatever the client sent. */
export function redactUrl(url: string, patterns: readonly TokenRoutePattern[]): string {
  const hashIndex = url.indexOf('#');
  const withoutHash = hashIndex === -1 ? url : url.slice(0, hashIndex);
  const queryIndex = withoutHash.indexOf('?');
  if (queryIndex === -1) return redactPath(withoutHash, patterns);
  return `${redactPath(withoutHash.slice(0, queryIndex), patterns)}?${redactQuery(withoutHash.slice(queryIndex + 1))}`;
}
