// The e-mail that carries an invoice: the PDF attached and the private pay link.
/** Same shape as the mail templates' content. */
interface MailContent {
  subject: string;
  text: string;
  html: string;
}

function escapeHtml(value: string): string {
  return value.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
}

export function invoiceMail(input: {
  companyName: string;
  customerName: string;
  reference: string;
  jobTitle: string;
  amountText: string;
  dueText: string;
  link: string;
}): MailContent {
  const lines = [
    `Hello ${input.customerName},`,
    `${input.companyName} has sent you invoice ${input.reference} for “${input.jobTitle}”. The PDF is attached.`,
    `The amount due is ${input.amountText}, by ${input.dueText}. Open the link below to see the invoice and pay it; the link is private to you.`,
  ];
  const html = [
    ...lines.map((l) => `<p>${escapeHtml(l)}</p>`),
    `<p><a href="${escapeHtml(input.link)}">See and pay the invoice</a></p>`,
  ].join('\n');
  return {
    subject: `Invoice ${input.reference} from ${input.companyName}`,
    text: `${lines.join('\n\n')}\n\n${input.link}\n`,
    html,
  };
}
