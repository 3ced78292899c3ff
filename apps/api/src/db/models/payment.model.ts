import { DataTypes, Model } from 'sequelize';
import type {
  CreationOptional,
  InferAttributes,
  InferCreationAttributes,
  Sequelize,
} from 'sequelize';

/** A payment against an invoice (migration 0014): recorded by hand (cheque, bank transfer, cash) or from the processor (card), whose ids are unique per company. */
export class PaymentModel extends Model<
  InferAttributes<PaymentModel>,
  InferCreationAttributes<PaymentModel>
> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare invoiceId: string;
  declare method: string;
  declare amountCents: number;
  declare refundedCents: CreationOptional<number>;
  declare receivedOn: string;
  declare receivedAt: Date | null;
  declare reference: string | null;
  declare processorPaymentIntentId: string | null;
  declare processorCheckoutSessionId: string | null;
  declare recordedBy: string | null;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    PaymentModel.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        companyId: { type: DataTypes.UUID, allowNull: false },
        invoiceId: { type: DataTypes.UUID, allowNull: false },
        method: { type: DataTypes.STRING(20), allowNull: false },
        amountCents: { type: DataTypes.BIGINT, allowNull: false },
        refundedCents: { type: DataTypes.BIGINT, allowNull: false, defaultValue: 0 },
        receivedOn: { type: DataTypes.DATEONLY, allowNull: false },
        receivedAt: { type: DataTypes.DATE(3), allowNull: true },
        reference: { type: DataTypes.STRING(200), allowNull: true },
        processorPaymentIntentId: { type: DataTypes.STRING(255), allowNull: true },
        processorCheckoutSessionId: { type: DataTypes.STRING(255), allowNull: true },
        recordedBy: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'payments', underscored: true, updatedAt: false },
    );
  }
}
