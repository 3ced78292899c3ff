// Outgoing mail through SMTP (maildev locally). Services depend on the `Mailer` interface only.
import nodemailer from 'nodemailer';
import type { Env } from '../config/env.js';

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html: string;
  attachments?: { filename: string; content: Buffer; contentType: string }[];
  /** A Message-ID of our own (angle brackets included), so a resent message is recognisable. */
  messageId?: string;
  /** The From display name (the address stays MAIL_FROM's). */
  fromName?: string;
}

/** The bare address of a `Name <address>` or plain address. */
function addressOf(from: string): string {
  return /<([^>]+)>/.exec(from)?.[1] ?? from.trim();
}

export interface Mailer {
  send(mail: OutgoingMail): Promise<void>;
  close(): void;
}

export function createMailer(smtp: Env['smtp']): Mailer {
  const transport = nodemailer.createTransport({
    host: smtp.host,
    port: smtp.port,
    secure: false,
    ignoreTLS: true,
  });
  return {
    async send({ fromName, ...mail }) {
      const from = fromName ? { name: fromName, address: addressOf(smtp.from) } : smtp.from;
      await transport.sendMail({ from, ...mail });
    },
    close() {
      transport.close();
    },
  };
}
