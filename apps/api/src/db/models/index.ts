// Registers every model on a Sequelize instance, and names the tenant models.
import type { Model, ModelStatic, Sequelize } from 'sequelize';
import { AuditEventModel } from './audit-event.model.js';
import { BookingModel } from './booking.model.js';
import { CompanyModel } from './company.model.js';
import { CrewMemberModel } from './crew-member.model.js';
import { CrewModel } from './crew.model.js';
import { CustomerModel } from './customer.model.js';
import { JobModel } from './job.model.js';
import { JobAreaModel } from './job-area.model.js';
import { LocateTicketModel } from './locate-ticket.model.js';
import { EstimateModel } from './estimate.model.js';
import { EstimateAnswerModel } from './estimate-answer.model.js';
import { EstimateLinkModel } from './estimate-link.model.js';
import { EstimatingSettingsModel } from './estimating-settings.model.js';
import { InvitationModel } from './invitation.model.js';
import { MembershipModel } from './membership.model.js';
import { PasswordResetModel } from './password-reset.model.js';
import { PriceBookItemModel } from './price-book-item.model.js';
import { RollAllocationModel } from './roll-allocation.model.js';
import { RollModel } from './roll.model.js';
import { SessionModel } from './session.model.js';
import { SiteModel } from './site.model.js';
import { TurfReservationModel } from './turf-reservation.model.js';
import { UploadModel } from './upload.model.js';
import { UserModel } from './user.model.js';
import { InvoiceModel } from './invoice.model.js';
import { InvoiceLineModel } from './invoice-line.model.js';
import { PaymentModel } from './payment.model.js';
import { RefundModel } from './refund.model.js';
import { CreditNoteModel } from './credit-note.model.js';
import { InvoiceLinkModel } from './invoice-link.model.js';
import { InvoiceReminderModel } from './invoice-reminder.model.js';
import { ReminderSettingsModel } from './reminder-settings.model.js';
import { guardTenantModels } from '../tenant-guard.js';
// JSON so that eslint.config.js (plain JS) reads the same list for the tenant-scope rule.
import tenantModelList from './tenant-models.json';

export {
  AuditEventModel,
  CreditNoteModel,
  InvoiceLineModel,
  InvoiceLinkModel,
  InvoiceModel,
  InvoiceReminderModel,
  PaymentModel,
  RefundModel,
  ReminderSettingsModel,
  BookingModel,
  CompanyModel,
  CrewMemberModel,
  CrewModel,
  CustomerModel,
  EstimateAnswerModel,
  EstimateLinkModel,
  EstimateModel,
  EstimatingSettingsModel,
  InvitationModel,
  JobAreaModel,
  JobModel,
  LocateTicketModel,
  MembershipModel,
  PasswordResetModel,
  PriceBookItemModel,
  RollAllocationModel,
  RollModel,
  SessionModel,
  SiteModel,
  TurfReservationModel,
  UploadModel,
  UserModel,
};

const allModels = [
  CompanyModel,
  UserModel,
  MembershipModel,
  InvitationModel,
  PasswordResetModel,
  CustomerModel,
  SiteModel,
  JobModel,
  JobAreaModel,
  AuditEventModel,
  SessionModel,
  PriceBookItemModel,
  EstimatingSettingsModel,
  RollModel,
  TurfReservationModel,
  RollAllocationModel,
  LocateTicketModel,
  EstimateModel,
  EstimateLinkModel,
  EstimateAnswerModel,
  InvoiceModel,
  InvoiceLineModel,
  PaymentModel,
  CreditNoteModel,
  InvoiceLinkModel,
  RefundModel,
  UploadModel,
  ReminderSettingsModel,
  InvoiceReminderModel,
  CrewModel,
  CrewMemberModel,
  BookingModel,
] as const;

/**
 * The models whose rows belong to one company (they carry company_id). Lint allows them to be
 * queried only through `scoped(ctx, Model)` or in an `unsafe…` function, and a hook refuses an
 * unscoped statement at run time (tenant-guard.ts); a unit test checks the list against the
 * models' attributes.
 */
export const tenantModelNames: readonly string[] = tenantModelList;

export const tenantModels: readonly ModelStatic<Model>[] = allModels.filter((model) =>
  tenantModelNames.includes(model.name),
);

export function initModels(sequelize: Sequelize): void {
  for (const model of allModels) model.initModel(sequelize);
  associateModels();
  guardTenantModels(tenantModels);
}

/**
 * Joins used by finds with `include` (the keys themselves live in the migrations, so
 * `constraints: false`). A job's customer and site share its company by the 0007 foreign keys.
 */
function associateModels(): void {
  JobModel.belongsTo(CustomerModel, {
    as: 'customer',
    foreignKey: 'customerId',
    constraints: false,
  });
  JobModel.belongsTo(SiteModel, { as: 'site', foreignKey: 'siteId', constraints: false });
  // An invoice's customer shares its company by the 0014 foreign key.
  InvoiceModel.belongsTo(CustomerModel, {
    as: 'customer',
    foreignKey: 'customerId',
    constraints: false,
  });
  AuditEventModel.belongsTo(UserModel, { as: 'user', foreignKey: 'userId', constraints: false });
  // Bookings reach their crew and job through the (company_id, …) keys of migration 0016.
  BookingModel.belongsTo(CrewModel, { as: 'crew', foreignKey: 'crewId', constraints: false });
  BookingModel.belongsTo(JobModel, { as: 'job', foreignKey: 'jobId', constraints: false });
  CrewMemberModel.belongsTo(UserModel, { as: 'user', foreignKey: 'userId', constraints: false });
}
