// Reminder settings, the reminder log and the invoices' next reminder day (migration 0019).
// Everything goes through scoped(), except the worker's claim, which is across companies.
import { QueryTypes } from 'sequelize';
import type { Sequelize } from 'sequelize';
import type { ReminderTemplates } from '@seamwright/domain';
import type { RequestContext } from '../../context.js';
import {
  InvoiceModel,
  InvoiceReminderModel,
  ReminderSettingsModel,
} from '../../db/models/index.js';
import type { Tx } from '../../db/sequelize.js';
import { scoped } from '../../db/tenant-scope.js';

export type InvoiceReminderRow = InvoiceReminderModel['_attributes'];

export interface ReminderSettingsRecord {
  enabled: boolean;
  offsets: number[];
  senderName: string | null;
  templates: ReminderTemplates;
}

const fromJson = (value: unknown): unknown =>
  typeof value === 'string' ? JSON.parse(value) : value;

/** The company's row, or null when it still runs on the standard schedule and wording. */
export async function findReminderSettings(
  ctx: RequestContext,
  options: { tx?: Tx; lock?: boolean } = {},
): Promise<(ReminderSettingsRecord & { id: string }) | null> {
  const [row] = await scoped(ctx, ReminderSettingsModel).findAll(
    options.tx ? { tx: options.tx, lock: options.lock ?? false } : {},
  );
  if (!row) return null;
  // Written only after validation by the settings service.
  return {
    id: row.id,
    enabled: Boolean(row.enabled),
    offsets: fromJson(row.offsets) as number[],
    senderName: row.senderName,
    templates: fromJson(row.templates) as ReminderTemplates,
  };
}

export async function saveReminderSettingsRow(
  ctx: RequestContext,
  id: string | null,
  values: ReminderSettingsRecord,
  tx: Tx,
): Promise<void> {
  const table = scoped(ctx, ReminderSettingsModel);
  if (id) await table.update(id, values, tx);
  else await table.create(values, tx);
}

export function createReminderLog(
  ctx: RequestContext,
  values: Omit<InvoiceReminderRow, 'id' | 'companyId' | 'createdAt'>,
  tx: Tx,
): Promise<InvoiceReminderRow> {
  return scoped(ctx, InvoiceReminderModel).create(values, tx);
}

export function updateReminderLog(
  ctx: RequestContext,
  id: string,
  values: Partial<Pick<InvoiceReminderRow, 'sentAt' | 'messageId' | 'error'>>,
  tx: Tx,
) {
  return scoped(ctx, InvoiceReminderModel).update(id, values, tx);
}

/** The invoice's reminders, oldest first. */
export function listRemindersOfInvoice(ctx: RequestContext, invoiceId: string) {
  return scoped(ctx, InvoiceReminderModel).findAll({
    where: { invoiceId },
    order: [
      ['createdAt', 'ASC'],
      ['id', 'ASC'],
    ],
  });
}

/** Schedule steps already sent for the invoice (manual reminders are not steps). */
export async function sentScheduledOffsets(
  ctx: RequestContext,
  invoiceId: string,
  tx?: Tx,
): Promise<number[]> {
  const rows = await scoped(ctx, InvoiceReminderModel).findAll({
    where: { invoiceId, kind: 'scheduled' },
    attributes: ['id', 'companyId', 'offsetDays'],
    ...(tx ? { tx } : {}),
  });
  return rows.flatMap((r) => (r.offsetDays === null ? [] : [r.offsetDays]));
}

export function setNextReminderOn(
  ctx: RequestContext,
  invoiceId: string,
  day: string | null,
  tx: Tx,
) {
  return scoped(ctx, InvoiceModel).update(invoiceId, { nextReminderOn: day }, tx);
}

/** The company's invoices whose reminders may still run, locked (settings changed). */
export function lockRemindableInvoices(ctx: RequestContext, statuses: readonly string[], tx: Tx) {
  return scoped(ctx, InvoiceModel).findAll({
    where: { status: [...statuses] },
    attributes: ['id', 'companyId', 'dueDate', 'sentAt', 'issuedOn', 'nextReminderOn'],
    tx,
    lock: true,
  });
}

export interface ClaimedInvoice {
  id: string;
  companyId: string;
}

/**
 * Unscoped on purpose: the reminder worker serves every company, and this claim is what tells
 * it which company each invoice belongs to; everything it does afterwards runs through scoped()
 * with a context built from the claimed row's company_id. FOR UPDATE SKIP LOCKED (MariaDB 10.6+;
 * the project's is 10.11) takes the row locks until `tx` ends and passes over rows another
 * worker holds, so two processes never work on one invoice at once and never wait on each other.
 */
export async function unsafeClaimDueInvoices(
  sequelize: Sequelize,
  input: { latestDay: string; statuses: readonly string[]; limit: number; exclude?: string[] },
  tx: Tx,
): Promise<ClaimedInvoice[]> {
  const rows = await sequelize.query<{ id: string; company_id: string }>(
    `SELECT id, company_id FROM invoices
      WHERE next_reminder_on <= :latestDay AND status IN (:statuses)${
        input.exclude?.length ? ' AND id NOT IN (:exclude)' : ''
      }
      ORDER BY next_reminder_on, company_id, id
      LIMIT :limit
      FOR UPDATE SKIP LOCKED`,
    {
      replacements: {
        latestDay: input.latestDay,
        statuses: [...input.statuses],
        limit: input.limit,
        exclude: input.exclude ?? [],
      },
      type: QueryTypes.SELECT,
      transaction: tx,
    },
  );
  return rows.map((r) => ({ id: r.id, companyId: r.company_id }));
}
