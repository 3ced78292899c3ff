// The crew calendar at desktop size: the office finds a digging booking on the calendar, drags
// it onto a day before the locate ticket's earliest dig date, sees it refused with the reason
// in words and the booking snap back; the crews page and a phone-sized view are pictured.
import { expect, test, type Page } from '@playwright/test';
import { addCalendarDays, localDateOf } from '@seamwright/domain';
import { emailFor, runStamp, signUpCompany } from './support/people';

test.use({ bypassCSP: true, timezoneId: 'America/Chicago' });

const shots = '../.tmp';
const timeZone = 'America/Chicago';

/** Calls the API with the page's session and CSRF token, as the web app does; returns `data`. */
async function call<T>(page: Page, method: 'GET' | 'POST' | 'PATCH', path: string, data?: unknown) {
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

async function drag(
  page: Page,
  from: ReturnType<Page['locator']>,
  to: ReturnType<Page['locator']>,
) {
  const a = await from.boundingBox();
  const b = await to.boundingBox();
  if (!a || !b) throw new Error('Nothing to drag from or to');
  await page.mouse.move(a.x + 10, a.y + a.height / 2);
  await page.mouse.down();
  await page.mouse.move(a.x + 20, a.y + a.height / 2, { steps: 4 });
  await page.mouse.move(b.x + b.width / 2, b.y + b.height / 2, { steps: 12 });
  await page.mouse.up();
}

test('the office drags digging before the earliest dig date and is refused with the reason', async ({
  page,
}) => {
  test.setTimeout(120_000);
  await page.setViewportSize({ width: 1280, height: 800 });
  await signUpCompany(page, {
    companyName: `Larkmoor Turf ${runStamp}`,
    name: 'Odile Larkmoor',
    email: emailFor('owner-calendar'),
  });
  await call(page, 'PATCH', '/api/company', { region: 'US-TX', timeZone });
  const crew = await call<{ id: string }>(page, 'POST', '/api/crews', {
    name: 'Heron crew',
    colour: 'lagoon',
    workingDays: [0, 1, 2, 3, 4, 5, 6],
    members: [{ name: 'Pell Ashdown' }],
  });
  await call(page, 'POST', '/api/crews', { name: 'Wren crew', colour: 'berry' });
  const customer = await call<{ id: string }>(page, 'POST', '/api/customers', {
    name: 'Tamsin Rookwood',
  });
  const site = await call<{ id: string }>(page, 'POST', `/api/customers/${customer.id}/sites`, {
    addressLine1: '41 Saltmarsh Lane',
    city: 'Quillmere',
  });
  const job = await call<{ id: string }>(page, 'POST', '/api/jobs', {
    customerId: customer.id,
    siteId: site.id,
    title: 'Rookwood back lawn',
  });
  await call(page, 'PATCH', `/api/jobs/${job.id}`, { status: 'estimated' });
  await call(page, 'PATCH', `/api/jobs/${job.id}`, { status: 'accepted' });
  const ticket = await call<{ earliestDigAt: string }>(
    page,
    'POST',
    `/api/jobs/${job.id}/locate-tickets`,
    {
      number: `TX-${runStamp}`,
      calledAt: new Date(Date.now() - 5 * 60_000).toISOString(),
    },
  );
  const opens = localDateOf(new Date(ticket.earliestDigAt), timeZone);
  const bookedDay = addCalendarDays(opens, 1);
  const tooEarly = addCalendarDays(opens, -1);
  const booking = await call<{ id: string }>(page, 'POST', '/api/bookings', {
    crewId: crew.id,
    jobId: job.id,
    startDate: bookedDay,
    endDate: addCalendarDays(bookedDay, 1),
    phase: 'tear_out_base',
  });

  // The month of the day before the window opens shows both days (six weeks are drawn).
  await page.goto(`/calendar?date=${tooEarly}`);
  await expect(page.getByRole('heading', { level: 1, name: 'Calendar' })).toBeVisible();
  const event = page.locator(`[data-booking-id="${booking.id}"]`).first();
  await expect(event).toContainText('Heron crew');
  await expect(event).toContainText('Tear-out and base');
  await expect(page.getByRole('list', { name: 'Crew colours' })).toContainText('Wren crew');
  const list = page.getByRole('table', { name: 'Bookings in view' });
  await expect(list).toContainText('Rookwood back lawn');
  await expect(list).toContainText('not marked clear yet');
  await page.screenshot({ path: `${shots}/calendar-month-desktop.png`, fullPage: true });

  await drag(page, event, page.locator(`.fc-daygrid-day[data-date="${tooEarly}"]`));
  const alert = page.getByRole('alert').filter({ hasText: 'Not changed' });
  await expect(alert).toContainText('Digging may not start before');
  await expect(alert).toContainText('earliest lawful start of the locate ticket');
  await page.screenshot({ path: `${shots}/calendar-refused-desktop.png`, fullPage: true });

  // Snapped back: the server kept the booking where it was, and so does the list.
  await expect(list).toContainText(bookedDay);
  const kept = await call<{ id: string; startDate: string }[]>(
    page,
    'GET',
    `/api/bookings?from=${tooEarly}&to=${addCalendarDays(bookedDay, 3)}`,
  );
  expect(kept.map((b) => [b.id, b.startDate])).toEqual([[booking.id, bookedDay]]);

  // The keyboard path: Add booking opens the form; the same refusal lands beside the first day.
  await page.getByRole('button', { name: 'Add booking' }).click();
  const form = page.getByRole('form', { name: 'New booking' });
  await form.getByLabel('Crew').selectOption({ label: 'Wren crew' });
  await form.getByLabel('Job').selectOption({ label: 'Rookwood back lawn · Tamsin Rookwood' });
  await form.getByLabel('First day').fill(tooEarly);
  await form.getByLabel('Last day').fill(tooEarly);
  await form.getByRole('button', { name: 'Book crew' }).click();
  await expect(form).toContainText('Digging may not start before');
  await form.getByLabel('Phase').selectOption({ label: 'Finishing' });
  await form.getByRole('button', { name: 'Book crew' }).click();
  await expect(page.getByRole('status').filter({ hasText: 'Crew booked.' })).toBeVisible();

  await page.setViewportSize({ width: 390, height: 844 });
  await page.screenshot({ path: `${shots}/calendar-phone.png`, fullPage: true });
  await page.setViewportSize({ width: 1280, height: 800 });
  await page.goto('/settings/crews');
  await expect(page.getByRole('heading', { level: 1, name: 'Crews' })).toBeVisible();
  await expect(page.getByRole('heading', { name: 'Heron crew' })).toBeVisible();
  await page.screenshot({ path: `${shots}/crews-desktop.png`, fullPage: true });
});
