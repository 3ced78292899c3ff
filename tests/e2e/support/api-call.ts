// Calls the API with the page's session and CSRF token, as the web app does, for the set-up a
// spec does not mean to test through the screens.
import { expect, type Page } from '@playwright/test';

/** Returns the answer's `data`; fails the test, with the answer, on anything but 2xx. */
export async function call<T>(
  page: Page,
  method: 'GET' | 'POST' | 'PATCH',
  path: string,
  data?: unknown,
): Promise<T> {
  const csrf = await page.request.get('/api/auth/csrf');
  const { data: token } = (await csrf.json()) as { data: { token: string } };
  const res = await page.request.fetch(path, {
    method,
    data,
    headers: { 'x-csrf-token': token.token },
  });
  expect(res.ok(), `${method} ${path}: ${res.status()} ${await res.text()}`).toBe(true);
  return ((await res.json()) as { data: T }).data;
}

/** The body of `POST /api/jobs/:id/areas` for a plain rectangle on a 15 ft roll, grain across. */
export function rectangleArea(name: string, widthFt: number, depthFt: number, extra: object = {}) {
  return {
    name,
    usage: 'landscape',
    area: {
      outer: [
        [0, 0],
        [widthFt, 0],
        [widthFt, depthFt],
        [0, depthFt],
      ],
      holes: [],
    },
    roll: { widthFt: 15, maxLengthFt: 100 },
    grain: { angleDeg: 90 },
    ...extra,
  };
}
