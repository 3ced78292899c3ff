import { DataTypes, Model } from 'sequelize';
import type {
  CreationOptional,
  InferAttributes,
  InferCreationAttributes,
  Sequelize,
} from 'sequelize';

/** One line of an invoice (migration 0014); `quantity` is DECIMAL(18,6), read back as a string by the driver. */
export class InvoiceLineModel extends Model<
  InferAttributes<InvoiceLineModel>,
  InferCreationAttributes<InvoiceLineModel>
> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare invoiceId: string;
  declare position: number;
  declare label: string;
  declare quantity: string | number;
  declare unit: string;
  declare unitPriceCents: number;
  declare amountCents: number;
  declare taxable: boolean;

  static initModel(sequelize: Sequelize): void {
    InvoiceLineModel.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        companyId: { type: DataTypes.UUID, allowNull: false },
        invoiceId: { type: DataTypes.UUID, allowNull: false },
        position: { type: DataTypes.INTEGER, allowNull: false },
        label: { type: DataTypes.STRING(300), allowNull: false },
        quantity: { type: DataTypes.DECIMAL(18, 6), allowNull: false },
        unit: { type: DataTypes.STRING(30), allowNull: false },
        unitPriceCents: { type: DataTypes.BIGINT, allowNull: false },
        amountCents: { type: DataTypes.BIGINT, allowNull: false },
        taxable: { type: DataTypes.BOOLEAN, allowNull: false },
      },
      { sequelize, tableName: 'invoice_lines', underscored: true, timestamps: false },
    );
  }
}
