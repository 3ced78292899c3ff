// Actions a person takes in the app, shared by the journeys.
import { expect, type Page } from '@playwright/test';

export const password = 'long-enough-pass-2026';

/** A value unique to this run, so runs never collide on e-mails or names. */
export const runStamp = `${Date.now().toString(36)}${Math.floor(Math.random() * 1e4).toString(36)}`;

export function emailFor(who: string): string {
  return `${who}-${runStamp}@e2e.seamwright.test`;
}

export async function signUpCompany(
  page: Page,
  company: { companyName: string; name: string; email: string },
): Promise<void> {
  await page.goto('/sign-up');
  await page.getByLabel('Company name').fill(company.companyName);
  await page.getByLabel('Your name').fill(company.name);
  await page.getByLabel('E-mail').fill(company.email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Create company' }).click();
  await expect(page.getByRole('heading', { level: 1 })).toContainText(
    company.name.split(' ')[0] ?? company.name,
  );
}

export async function invite(
  page: Page,
  email: string,
  role: 'Office' | 'Crew lead' | 'Bookkeeper' | 'Owner',
): Promise<void> {
  const form = page.getByRole('form', { name: 'Invite someone' });
  await form.getByLabel('E-mail').fill(email);
  await form.getByLabel('Role').selectOption({ label: role });
  await form.getByRole('button', { name: 'Send invitation' }).click();
  await expect(page.getByText(`Invitation sent to ${email}.`)).toBeVisible();
}

export async function acceptInvitation(
  page: Page,
  invitationPath: string,
  name: string,
): Promise<void> {
  await page.goto(invitationPath);
  await page.getByLabel('Your name').fill(name);
  await page.getByLabel('Choose a password').fill(password);
  await page.getByRole('button', { name: /^Join / }).click();
  await expect(page.getByRole('heading', { level: 1 })).toContainText(name.split(' ')[0] ?? name);
}

/** The section links in the desktop rail. */
export function rail(page: Page) {
  return page.getByRole('navigation', { name: 'Sections' }).first();
}
