import { DataTypes, Model } from 'sequelize';
import type {
  CreationOptional,
  InferAttributes,
  InferCreationAttributes,
  Sequelize,
} from 'sequelize';

/** A refund of a card payment through the processor (migration 0021). */
export class RefundModel extends Model<
  InferAttributes<RefundModel>,
  InferCreationAttributes<RefundModel>
> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare invoiceId: string;
  declare paymentId: string;
  declare amountCents: number;
  declare reason: string;
  declare processorRefundId: string;
  declare createdBy: string | null;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    RefundModel.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        companyId: { type: DataTypes.UUID, allowNull: false },
        invoiceId: { type: DataTypes.UUID, allowNull: false },
        paymentId: { type: DataTypes.UUID, allowNull: false },
        amountCents: { type: DataTypes.BIGINT, allowNull: false },
        reason: { type: DataTypes.STRING(500), allowNull: false },
        processorRefundId: { type: DataTypes.STRING(255), allowNull: false },
        createdBy: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'refunds', underscored: true, updatedAt: false },
    );
  }
}
