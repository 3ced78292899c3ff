// The wording of Seamwright's e-mails. Plain text first; the HTML is the same words.
import type { Role } from '@seamwright/shared';
import { roleLabels } from '@seamwright/shared';

interface MailContent {
  subject: string;
  text: string;
  html: string;
}

function escapeHtml(value: string): string {
  return value.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
}

function htmlFrom(paragraphs: string[], link: { href: string; label: string }): string {
  const body = paragraphs.map((p) => `<p>${escapeHtml(p)}</p>`).join('\n');
  const button = `<p><a href="${escapeHtml(link.href)}">${escapeHtml(link.label)}</a></p>`;
  return `<!doctype html><html><body style="font-family: sans-serif">${body}\n${button}</body></html>`;
}

export function invitationMail(input: {
  companyName: string;
  inviterName: string;
  role: Role;
  link: string;
}): MailContent {
  const lines = [
    `${input.inviterName} has asked you to join ${input.companyName} on Seamwright as ${roleLabels[input.role]}.`,
    'Open the link below to set up your sign-in. The link works for 7 days and only once.',
  ];
  return {
    subject: `Join ${input.companyName} on Seamwright`,
    text: `${lines.join('\n\n')}\n\n${input.link}\n\nIf you were not expecting this, you can ignore this message.\n`,
    html: htmlFrom(lines, { href: input.link, label: 'Accept the invitation' }),
  };
}

export function passwordResetMail(input: { name: string; link: string }): MailContent {
  const lines = [
    `Hello ${input.name},`,
    'Someone (hopefully you) asked to choose a new Seamwright password for this address.',
    'The link below works for one hour and only once. If you did not ask, ignore this message; your password stays as it is.',
  ];
  return {
    subject: 'Choose a new Seamwright password',
    text: `${lines.join('\n\n')}\n\n${input.link}\n`,
    html: htmlFrom(lines, { href: input.link, label: 'Choose a new password' }),
  };
}

export function estimateMail(input: {
  companyName: string;
  customerName: string;
  jobTitle: string;
  validUntilText: string;
  link: string;
}): MailContent {
  const lines = [
    `Hello ${input.customerName},`,
    `${input.companyName} has sent you an estimate for “${input.jobTitle}”. The PDF is attached.`,
    `Open the link below to look at the estimate and the plan, and to accept or decline it. The link is private to you and works until ${input.validUntilText}.`,
  ];
  return {
    subject: `Your estimate from ${input.companyName}`,
    text: `${lines.join('\n\n')}\n\n${input.link}\n`,
    html: htmlFrom(lines, { href: input.link, label: 'See the estimate' }),
  };
}

export function estimateAnswerMail(input: {
  companyName: string;
  customerName: string;
  jobTitle: string;
  answer: string;
  details: string[];
  link: string;
}): MailContent {
  const lines = [
    `${input.customerName} ${input.answer} the estimate for “${input.jobTitle}”.`,
    ...input.details,
  ];
  return {
    subject: `${input.customerName} ${input.answer} the estimate for ${input.jobTitle}`,
    text: `${lines.join('\n\n')}\n\n${input.link}\n`,
    html: htmlFrom(lines, { href: input.link, label: 'Open the job' }),
  };
}
