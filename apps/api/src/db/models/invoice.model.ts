import { DataTypes, Model } from 'sequelize';
import type {
  CreationOptional,
  InferAttributes,
  InferCreationAttributes,
  Sequelize,
} from 'sequelize';

/** An invoice (migration 0014). Money columns are BIGINT cents, read back through Number() by the repository (cents stay far below 2^53). `status` is stored without `overdue`, which depends on the day it is read. */
export class InvoiceModel extends Model<
  InferAttributes<InvoiceModel>,
  InferCreationAttributes<InvoiceModel>
> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare jobId: string;
  declare customerId: string;
  declare estimateId: string | null;
  declare number: number;
  declare kind: string;
  declare status: string;
  declare issuedOn: string;
  declare dueDate: string;
  declare currency: string;
  declare taxRateBasisPoints: number;
  declare subtotalCents: number;
  declare taxCents: number;
  declare totalCents: number;
  declare paidCents: CreationOptional<number>;
  declare refundedCents: CreationOptional<number>;
  declare creditedCents: CreationOptional<number>;
  declare notes: string | null;
  declare sentAt: Date | null;
  declare voidedAt: Date | null;
  declare voidReason: string | null;
  /** The day the reminder worker next looks at it (migration 0019); null: nothing scheduled. */
  declare nextReminderOn?: string | null;
  declare createdBy: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    InvoiceModel.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        companyId: { type: DataTypes.UUID, allowNull: false },
        jobId: { type: DataTypes.UUID, allowNull: false },
        customerId: { type: DataTypes.UUID, allowNull: false },
        estimateId: { type: DataTypes.UUID, allowNull: true },
        number: { type: DataTypes.INTEGER, allowNull: false },
        kind: { type: DataTypes.STRING(10), allowNull: false },
        status: { type: DataTypes.STRING(12), allowNull: false },
        issuedOn: { type: DataTypes.DATEONLY, allowNull: false },
        dueDate: { type: DataTypes.DATEONLY, allowNull: false },
        currency: { type: DataTypes.CHAR(3), allowNull: false },
        taxRateBasisPoints: { type: DataTypes.INTEGER, allowNull: false },
        subtotalCents: { type: DataTypes.BIGINT, allowNull: false },
        taxCents: { type: DataTypes.BIGINT, allowNull: false },
        totalCents: { type: DataTypes.BIGINT, allowNull: false },
        paidCents: { type: DataTypes.BIGINT, allowNull: false, defaultValue: 0 },
        refundedCents: { type: DataTypes.BIGINT, allowNull: false, defaultValue: 0 },
        creditedCents: { type: DataTypes.BIGINT, allowNull: false, defaultValue: 0 },
        notes: { type: DataTypes.TEXT, allowNull: true },
        sentAt: { type: DataTypes.DATE(3), allowNull: true },
        voidedAt: { type: DataTypes.DATE(3), allowNull: true },
        voidReason: { type: DataTypes.STRING(500), allowNull: true },
        nextReminderOn: { type: DataTypes.DATEONLY, allowNull: true },
        createdBy: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'invoices', underscored: true },
    );
  }
}
