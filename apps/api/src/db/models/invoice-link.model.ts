import { DataTypes, Model } from 'sequelize';
import type {
  CreationOptional,
  InferAttributes,
  InferCreationAttributes,
  Sequelize,
} from 'sequelize';

/** A private pay link to a sent invoice (migration 0014): only the token's SHA-256 is kept. */
export class InvoiceLinkModel extends Model<
  InferAttributes<InvoiceLinkModel>,
  InferCreationAttributes<InvoiceLinkModel>
> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare invoiceId: string;
  declare tokenHash: string;
  declare expiresAt: Date;
  declare revokedAt: Date | null;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    InvoiceLinkModel.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        companyId: { type: DataTypes.UUID, allowNull: false },
        invoiceId: { type: DataTypes.UUID, allowNull: false },
        tokenHash: { type: DataTypes.CHAR(64), allowNull: false },
        expiresAt: { type: DataTypes.DATE(3), allowNull: false },
        revokedAt: { type: DataTypes.DATE(3), allowNull: true },
        createdAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'invoice_links', underscored: true, updatedAt: false },
    );
  }
}
