import { DataTypes, Model } from 'sequelize';
import type {
  CreationOptional,
  InferAttributes,
  InferCreationAttributes,
  Sequelize,
} from 'sequelize';

/** One payment reminder sent for an invoice (migration 0019); scheduled steps are unique. */
export class InvoiceReminderModel extends Model<
  InferAttributes<InvoiceReminderModel>,
  InferCreationAttributes<InvoiceReminderModel>
> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare invoiceId: string;
  declare kind: string;
  declare offsetDays: number | null;
  declare dueOn: string | null;
  declare sentAt: Date | null;
  declare messageId: string | null;
  declare toAddress: string;
  declare error: string | null;
  declare createdBy: string | null;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    InvoiceReminderModel.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        companyId: { type: DataTypes.UUID, allowNull: false },
        invoiceId: { type: DataTypes.UUID, allowNull: false },
        kind: { type: DataTypes.STRING(10), allowNull: false },
        offsetDays: { type: DataTypes.INTEGER, allowNull: true },
        dueOn: { type: DataTypes.DATEONLY, allowNull: true },
        sentAt: { type: DataTypes.DATE(3), allowNull: true },
        messageId: { type: DataTypes.STRING(255), allowNull: true },
        toAddress: { type: DataTypes.STRING(320), allowNull: false },
        error: { type: DataTypes.STRING(500), allowNull: true },
        createdBy: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'invoice_reminders', underscored: true, updatedAt: false },
    );
  }
}
