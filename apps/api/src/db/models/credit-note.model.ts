import { DataTypes, Model } from 'sequelize';
import type {
  CreationOptional,
  InferAttributes,
  InferCreationAttributes,
  Sequelize,
} from 'sequelize';

/** A credit note against an invoice (migration 0014), numbered in its own gapless sequence. */
export class CreditNoteModel extends Model<
  InferAttributes<CreditNoteModel>,
  InferCreationAttributes<CreditNoteModel>
> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare invoiceId: string;
  declare number: number;
  declare amountCents: number;
  declare reason: string;
  declare issuedOn: string;
  declare createdBy: string | null;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    CreditNoteModel.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        companyId: { type: DataTypes.UUID, allowNull: false },
        invoiceId: { type: DataTypes.UUID, allowNull: false },
        number: { type: DataTypes.INTEGER, allowNull: false },
        amountCents: { type: DataTypes.BIGINT, allowNull: false },
        reason: { type: DataTypes.STRING(500), allowNull: false },
        issuedOn: { type: DataTypes.DATEONLY, allowNull: false },
        createdBy: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'credit_notes', underscored: true, updatedAt: false },
    );
  }
}
