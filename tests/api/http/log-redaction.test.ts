// One-time tokens and passwords never reach the request log: the URLs of token routes are
// logged with the token replaced, query tokens too, and bodies not at all.
import { afterAll, describe, expect, it } from 'vitest';
import { newClient } from '../../fixtures/client.js';
import { signUpCompany, testPassword, uniqueEmail } from '../../fixtures/factories.js';
import { tokenFromMail, waitForMail } from '../../fixtures/mail.js';
import { createLoggedApp } from './log-capture.js';

const logged = createLoggedApp('info');
const { app } = logged;
const newPassword = 'a-logged-reset-password-7';

afterAll(async () => {
  await logged.close();
});

function loggedUrls(): string[] {
  return logged
    .output()
    .split('\n')
    .filter(Boolean)
    .map((line) => (JSON.parse(line) as { req?: { url?: string } }).req?.url)
    .filter((url): url is string => typeof url === 'string');
}

describe('request logs', () => {
  it('keep reset and invitation tokens, and the passwords sent with them, out', async () => {
    const owner = await signUpCompany(app);

    const email = uniqueEmail('logged-invitee');
    await owner.client.post('/api/invitations', { email, role: 'office' }).expect(201);
    const inviteToken = tokenFromMail(await waitForMail(email), 'invitations');
    const invitee = await newClient(app);
    await invitee.get(`/api/invitations/${inviteToken}`).expect(200);
    await invitee
      .post(`/api/invitations/${inviteToken}/accept`, {
        name: 'Lou Logged',
        password: testPassword,
      })
      .expect(200);
    // A token in a query string, and one sent to a mistyped route.
    await invitee.get(`/api/invitations?token=${inviteToken}&page=2`);
    await invitee.get(`/api/invitation/${inviteToken}`).expect(404);

    // Last: completing the reset ends the owner's session.
    const anonymous = await newClient(app);
    await anonymous.post('/api/auth/password-reset', { email: owner.email }).expect(202);
    const resetToken = tokenFromMail(await waitForMail(owner.email), 'reset-password');
    await anonymous
      .post(`/api/auth/password-reset/${resetToken}`, { password: newPassword })
      .expect(204);

    const output = logged.output();
    for (const secret of [resetToken, inviteToken, newPassword, testPassword])
      expect(output).not.toContain(secret);

    const urls = loggedUrls();
    expect(urls).toEqual(
      expect.arrayContaining([
        '/api/auth/password-reset/[redacted]',
        '/api/invitations/[redacted]',
        '/api/invitations/[redacted]/accept',
        '/api/invitations?token=[redacted]&page=2',
        '/api/invitation/[redacted]',
        '/api/auth/password-reset',
      ]),
    );
  });
});
