// The local mail sink: maildev on 127.0.0.1, storing mail under .data/<name>/mail.
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { MailDev } from 'maildev';
import { dataRoot } from './paths.js';
import { say } from './log.js';

export interface MailSink {
  smtpPort: number;
  webUrl: string;
  stop(): Promise<void>;
}

/** Starts maildev on the given ports, bound to loopback only. */
export async function startMailSink(
  name: string,
  smtpPort: number,
  webPort: number,
): Promise<MailSink> {
  const mailDirectory = join(dataRoot, name, 'mail');
  mkdirSync(mailDirectory, { recursive: true });
  const maildev = new MailDev({
    smtp: smtpPort,
    web: webPort,
    ip: '127.0.0.1',
    webIp: '127.0.0.1',
    silent: true,
    mailDirectory,
  });
  await maildev.start();
  const webUrl = `http://127.0.0.1:${webPort}`;
  say('mail', `maildev: SMTP 127.0.0.1:${smtpPort}, inbox ${webUrl}`);
  return { smtpPort, webUrl, stop: () => maildev.stop() };
}
