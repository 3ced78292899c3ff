// A company's effective reminder settings: its saved row, or the standard schedule and wording.
import {
  defaultReminderOffsets,
  defaultReminderTemplates,
  reminderPlaceholders,
} from '@seamwright/domain';
import type { ReminderSettingsView } from '@seamwright/shared';
import type { RequestContext } from '../../context.js';
import type { Tx } from '../../db/sequelize.js';
import type { ReminderSettingsRecord } from './reminders.repository.js';
import { findReminderSettings } from './reminders.repository.js';

export function standardReminderSettings(): ReminderSettingsRecord {
  return {
    enabled: true,
    offsets: [...defaultReminderOffsets],
    senderName: null,
    templates: structuredClone(defaultReminderTemplates),
  };
}

/** The saved settings, with any template kind missing from the row taken from the standard. */
export async function effectiveReminderSettings(
  ctx: RequestContext,
  options: { tx?: Tx; lock?: boolean } = {},
): Promise<ReminderSettingsRecord & { id: string | null }> {
  const row = await findReminderSettings(ctx, options);
  if (!row) return { id: null, ...standardReminderSettings() };
  return { ...row, templates: { ...defaultReminderTemplates, ...row.templates } };
}

export function toReminderSettingsView(record: ReminderSettingsRecord): ReminderSettingsView {
  return {
    enabled: record.enabled,
    offsets: [...record.offsets].sort((a, b) => a - b),
    senderName: record.senderName,
    templates: record.templates,
    placeholders: [...reminderPlaceholders],
    defaults: { offsets: [...defaultReminderOffsets], templates: defaultReminderTemplates },
  };
}
