import { afterEach, describe, expect, it, vi } from 'vitest';
import { ErrorCode } from '@seamwright/shared';
import { ApiError, api, refreshCsrfToken, setCompanyAccessEndedHandler } from './api-client';

function problem(status: number, body: unknown): Response {
  return new Response(JSON.stringify(body), {
    status,
    headers: { 'content-type': 'application/problem+json' },
  });
}

function json(body: unknown, status = 200): Response {
  return new Response(JSON.stringify(body), {
    status,
    headers: { 'content-type': 'application/json' },
  });
}

/** A fake network that answers by URL and method and remembers what was sent. */
function stubFetch(answer: (url: string, init: RequestInit) => Response) {
  const calls: Array<{ url: string; init: RequestInit }> = [];
  vi.stubGlobal('fetch', (url: string, init: RequestInit = {}) => {
    calls.push({ url, init });
    return Promise.resolve(answer(url, init));
  });
  return calls;
}

afterEach(async () => {
  vi.unstubAllGlobals();
  stubFetch(() => json({ data: { token: 'reset' } }));
  await refreshCsrfToken(); // leave a known token cache for the next test
  vi.unstubAllGlobals();
});

describe('api client error mapping', () => {
  it('turns a problem+json validation answer into an ApiError with its field errors', async () => {
    stubFetch(() =>
      problem(400, {
        type: 'https://seamwright.test/problems/validation-failed',
        title: 'Some fields need attention',
        status: 400,
        detail: 'Check the highlighted fields',
        code: 'VALIDATION_FAILED',
        requestId: 'req-1',
        errors: [
          { path: 'email', message: 'Enter a valid e-mail address' },
          { path: 'sites.0.city', message: 'Town or city is required' },
          { path: 42, message: 'ignored: not a string path' },
        ],
      }),
    );
    const error = await api.get('/customers').catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ApiError);
    const apiError = error as ApiError;
    expect(apiError.status).toBe(400);
    expect(apiError.code).toBe(ErrorCode.ValidationFailed);
    expect(apiError.detail).toBe('Check the highlighted fields');
    expect(apiError.requestId).toBe('req-1');
    expect(apiError.fieldErrors).toEqual([
      { path: 'email', message: 'Enter a valid e-mail address' },
      { path: 'sites.0.city', message: 'Town or city is required' },
    ]);
    expect(apiError.fieldMessage('sites.0.city')).toBe('Town or city is required');
  });

  it('hands 403 COMPANY_ACCESS_ENDED to the router (choose a company) and still throws', async () => {
    const ended = vi.fn();
    setCompanyAccessEndedHandler(ended);
    stubFetch(() =>
      problem(403, { type: 'x', title: 'ended', status: 403, code: 'COMPANY_ACCESS_ENDED' }),
    );
    const error = await api.get('/customers').catch((e: unknown) => e);
    setCompanyAccessEndedHandler(null);
    expect((error as ApiError).code).toBe(ErrorCode.CompanyAccessEnded);
    expect(ended).toHaveBeenCalledTimes(1);
  });

  it('derives a code from the status when the body is not problem+json', async () => {
    stubFetch(
      () =>
        new Response('<html>Bad gateway</html>', {
          status: 502,
          headers: { 'content-type': 'text/html' },
        }),
    );
    const error = (await api.get('/me').catch((e: unknown) => e)) as ApiError;
    expect(error.code).toBe(ErrorCode.Internal);
    expect(error.status).toBe(502);
    expect(error.fieldErrors).toEqual([]);
  });

  it('sends cookies, and the CSRF token on writes but not on reads', async () => {
    const calls = stubFetch((url) =>
      url.endsWith('/auth/csrf')
        ? json({ data: { token: 'tok-1' } })
        : json({ data: { id: 'c1' } }, 201),
    );
    await refreshCsrfToken();
    await api.get('/customers');
    await api.post('/customers', { name: 'Ada' });
    const read = calls.find((c) => c.url === '/api/customers' && c.init.method === 'GET');
    const write = calls.find((c) => c.init.method === 'POST');
    expect(read?.init.credentials).toBe('include');
    expect((read?.init.headers as Record<string, string>)['x-csrf-token']).toBeUndefined();
    expect((write?.init.headers as Record<string, string>)['x-csrf-token']).toBe('tok-1');
    expect(write?.init.body).toBe(JSON.stringify({ name: 'Ada' }));
  });

  it('fetches a fresh CSRF token once and retries after CSRF_INVALID', async () => {
    let tokens = 0;
    let posts = 0;
    const calls = stubFetch((url, init) => {
      if (url.endsWith('/auth/csrf')) return json({ data: { token: `tok-${++tokens}` } });
      posts += 1;
      const sent = (init.headers as Record<string, string>)['x-csrf-token'];
      if (sent === 'tok-2') return json({ data: { ok: true } });
      return problem(403, { type: 'x', title: 'expired', status: 403, code: 'CSRF_INVALID' });
    });
    await refreshCsrfToken();
    await expect(api.post('/customers', {})).resolves.toEqual({ data: { ok: true } });
    expect(posts).toBe(2);
    expect(calls.filter((c) => c.url.endsWith('/auth/csrf'))).toHaveLength(2);
  });

  it('builds query strings and leaves out empty values', async () => {
    const calls = stubFetch(() => json({ data: [], meta: { page: 1, pageSize: 25, total: 0 } }));
    await api.get('/customers', {
      query: { page: 2, q: '', status: 'all', sort: '-name', missing: undefined },
    });
    expect(calls[0]?.url).toBe('/api/customers?page=2&status=all&sort=-name');
  });
});
