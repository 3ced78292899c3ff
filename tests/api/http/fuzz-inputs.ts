// What the HTTP fuzz sends: header variants, path segments and bodies a careless or hostile
// client might produce, and the credentials of a signed-in test client as raw headers.
import type { RouteEntry } from '@seamwright/api';
import type { Client } from '../../fixtures/client.js';

/** The Cookie and x-csrf-token headers a browser with this client's cookies would send. */
export function credentials(client: Client): { cookie: string; 'x-csrf-token': string } {
  const cookies = client.agent.jar.getCookies({
    domain: '127.0.0.1',
    path: '/',
    secure: false,
    script: false,
  });
  return {
    cookie: cookies.map((c) => `${c.name}=${c.value}`).join('; '),
    'x-csrf-token': client.csrf,
  };
}

export const contentTypes = [
  undefined,
  'application/json',
  'application/json; charset=utf-8',
  'APPLICATION/JSON; CHARSET=UTF-8',
  'application/json; charset=latin1',
  'application/json; charset="utf-16"',
  'application/json; charset=',
  'application/json;;;',
  'application/merge-patch+json',
  'application/*',
  'text/plain',
  'text/html; charset=utf-8',
  'application/x-www-form-urlencoded',
  'multipart/form-data; boundary=----x',
  'garbage',
  '',
  ';',
];

export const contentEncodings = [
  undefined,
  'identity',
  'gzip',
  'GZIP',
  'deflate',
  'br',
  'bogus',
  'gzip, br',
  '',
];

export const accepts = [
  undefined,
  '*/*',
  'application/json',
  'application/problem+json',
  'text/html',
  'application/xml;q=0.9, */*;q=0',
  'image/*;q=0',
  'garbage;;q=abc',
  ',,,',
];

export const bodies = [
  undefined,
  '',
  '{}',
  '{"name":',
  'null',
  '[]',
  '"text"',
  '{"__proto__":{"admin":true},"constructor":{"prototype":{}}}',
  '{"name":"\u0000\ud800"}',
  `${'['.repeat(2000)}${']'.repeat(2000)}`,
  'name=form&x=1',
];

/** Cookie headers besides the client's own; some are appended to the real ones. */
export const cookieVariants = [
  'sw.csrf=%E0',
  'sw.sid=%E0',
  'sw.sid=s%3Aforged.signature',
  'sw.sid=s:',
  'sw.sid=a; sw.sid=b',
  'sw.csrf=' + 'f'.repeat(64),
  '=;;=; ;',
  'sw.sid="unterminated',
  `big=${'c'.repeat(6000)}`,
  '%E0%A4%A=%E0%A4%A',
];

export const csrfTokens = ['', 'x', 'x'.repeat(5000), 'Ã©Ã¨', '%E0', 'null'];

export const originHeaders: Record<string, string>[] = [
  {},
  { origin: 'null' },
  { origin: 'https://elsewhere.example' },
  { 'sec-fetch-site': 'cross-site' },
  { 'sec-fetch-site': 'same-origin' },
  { 'sec-fetch-site': 'none' },
];

/** Path segments to put where a route has a parameter; all already valid on the wire. */
export const pathSegments = [
  '%E0%A4%A',
  '%',
  '%%',
  '%zz',
  '%00',
  'a%00b',
  '..',
  '.',
  '%2e%2e',
  '%2F',
  '%2F..%2F..%2Fetc%2Fpasswd',
  ';',
  '%20',
  '~',
  encodeURIComponent('ü漢字🙂'),
  '%F0%9F',
  encodeURIComponent(`'; DROP TABLE users; --`),
  'x'.repeat(4000),
  '0B6F3F7E-8A9C-4D2E-9F10-1A2B3C4D5E6F',
  '00000000-0000-0000-0000-000000000000',
];

/** The route's path with every `:param` replaced by `segment`. */
export function pathFor(route: RouteEntry, segment: string): string {
  return route.path
    .split('/')
    .map((part) => (part.startsWith(':') ? segment : part))
    .join('/');
}
