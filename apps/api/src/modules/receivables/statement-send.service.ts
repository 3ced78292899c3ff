// "Send statement now": the customer's statement PDF e-mailed through the mailer (maildev
// locally). Nothing is stored, so a failed e-mail changes nothing: the answer is 503, send again.
import type { SendStatementInput, StatementSentView } from '@seamwright/shared';
import type { RequestContext } from '../../context.js';
import type { ServiceDeps } from '../../deps.js';
import { AppError } from '../../errors.js';
import { formatMoney, renderStatementPdf } from '../estimate-document/index.js';
import { buildStatement } from './statement.service.js';

function escapeHtml(value: string): string {
  return value.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
}

export function statementFilename(customerName: string, asOf: string): string {
  const slug = customerName
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-|-$/g, '');
  return `statement-${slug || 'customer'}-${asOf}.pdf`;
}

export async function sendStatement(
  deps: ServiceDeps,
  ctx: RequestContext,
  customerId: string,
  input: SendStatementInput,
): Promise<StatementSentView> {
  const statement = await buildStatement(ctx, deps.sequelize, customerId);
  const to = input.to ?? statement.customer.email;
  if (!to) {
    const message = 'The customer has no e-mail address: give one to send to';
    throw new AppError('VALIDATION_FAILED', `to: ${message}`, {
      errors: [{ path: 'to', message }],
    });
  }
  const pdf = await renderStatementPdf(statement);
  const owed = formatMoney(statement.balanceCents, statement.currency);
  const lines = [
    `Hello ${statement.customer.name},`,
    `${statement.company.name} has sent your statement as of ${statement.issuedOn}. The PDF is attached.`,
    statement.balanceCents > 0
      ? `The balance due is ${owed}.`
      : 'Nothing is owed at the moment. Thank you.',
  ];
  try {
    await deps.mailer.send({
      to,
      subject: `Statement from ${statement.company.name}`,
      text: `${lines.join('\n\n')}\n`,
      html: lines.map((l) => `<p>${escapeHtml(l)}</p>`).join('\n'),
      attachments: [
        {
          filename: statementFilename(statement.customer.name, statement.issuedOn),
          content: pdf,
          contentType: 'application/pdf',
        },
      ],
    });
  } catch (error) {
    deps.logger.error({ err: error, customerId }, 'statement e-mail could not be sent');
    throw new AppError('SERVICE_BUSY', 'The statement could not be e-mailed: try again', {
      headers: { 'Retry-After': '60' },
    });
  }
  return { to, asOf: statement.issuedOn, balanceCents: statement.balanceCents };
}
