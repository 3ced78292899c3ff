// Registers every model on a Sequelize instance.
import type { Sequelize } from 'sequelize';
import { AuditEventModel } from './audit-event.model.js';
import { CompanyModel } from './company.model.js';
import { CustomerModel } from './customer.model.js';
import { InvitationModel } from './invitation.model.js';
import { MembershipModel } from './membership.model.js';
import { PasswordResetModel } from './password-reset.model.js';
import { SessionModel } from './session.model.js';
import { SiteModel } from './site.model.js';
import { UserModel } from './user.model.js';

export {
  AuditEventModel,
  CompanyModel,
  CustomerModel,
  InvitationModel,
  MembershipModel,
  PasswordResetModel,
  SessionModel,
  SiteModel,
  UserModel,
};

export function initModels(sequelize: Sequelize): void {
  for (const model of [
    CompanyModel,
    UserModel,
    MembershipModel,
    InvitationModel,
    PasswordResetModel,
    CustomerModel,
    SiteModel,
    AuditEventModel,
    SessionModel,
  ]) {
    model.initModel(sequelize);
  }
}
