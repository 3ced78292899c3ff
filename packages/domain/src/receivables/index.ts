// Receivables: aging of what customers owe, the reminder schedule, and the water a replaced
// lawn saves (for the owner's numbers).
export { ageReceivables, agingBucketFor, agingBucketNames, emptyAgingBuckets } from './aging.js';
export type {
  AgingBucketName,
  AgingBuckets,
  AgingReport,
  CustomerAging,
  OpenBalance,
} from './aging.js';
export {
  defaultReminderOffsets,
  describeReminderOffset,
  dueReminderStep,
  nextReminderOn,
  reminderKindOf,
  maxReminderOffsetDays,
  reminderScheduleProblem,
  reminderSteps,
  remindableInvoiceStatuses,
} from './reminder-schedule.js';
export type { ReminderKind, ReminderStep } from './reminder-schedule.js';
export {
  defaultReminderTemplates,
  reminderPlaceholders,
  reminderTemplateKinds,
  reminderTemplateProblem,
  renderReminderTemplate,
  unknownPlaceholders,
} from './reminder-templates.js';
export type {
  ReminderPlaceholder,
  ReminderTemplate,
  ReminderTemplates,
  ReminderValues,
} from './reminder-templates.js';
export { waterSavedPerYear, waterSavingsRuleFor, waterSavingsRules } from './water-savings.js';
export type { WaterSaved, WaterSavingsRule } from './water-savings.js';
