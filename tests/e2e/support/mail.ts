// Reads the e-mails the app sent from maildev's REST API, to follow links as a person would.
import { expect } from '@playwright/test';
import { mailUrl } from './servers';

interface MailMessage {
  id: string;
  subject: string;
  text?: string;
  html?: string;
  time: string;
  to: Array<{ address: string }>;
}

async function listMail(): Promise<MailMessage[]> {
  // maildev 3 serves its REST API under /api/email; older releases used /email.
  for (const path of ['/api/email', '/email']) {
    const response = await fetch(`${mailUrl}${path}`);
    if (response.ok) return (await response.json()) as MailMessage[];
  }
  throw new Error(`maildev at ${mailUrl} did not answer its e-mail list`);
}

/** Waits for the newest e-mail to `address` whose text holds a link matching `pattern`; returns the link's path. */
export async function linkFromMail(address: string, pattern: RegExp): Promise<string> {
  let found: string | undefined;
  await expect
    .poll(
      async () => {
        const messages = (await listMail()).filter((m) =>
          m.to.some((to) => to.address.toLowerCase() === address.toLowerCase()),
        );
        messages.sort((a, b) => b.time.localeCompare(a.time));
        for (const message of messages) {
          const body = `${message.text ?? ''}\n${message.html ?? ''}`;
          const match = body.match(new RegExp(`https?://[^\\s"'<>]*${pattern.source}`));
          if (match) {
            found = new URL(match[0]).pathname;
            return true;
          }
        }
        return false;
      },
      { message: `an e-mail to ${address} with a link like ${pattern}`, timeout: 15_000 },
    )
    .toBe(true);
  return found ?? '';
}
