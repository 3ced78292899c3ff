import { DataTypes, Model } from 'sequelize';
import type {
  CreationOptional,
  InferAttributes,
  InferCreationAttributes,
  Sequelize,
} from 'sequelize';

/** A private link to a sent estimate (migration 0011): only the token's SHA-256 is kept. */
export class EstimateLinkModel extends Model<
  InferAttributes<EstimateLinkModel>,
  InferCreationAttributes<EstimateLinkModel>
> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare estimateId: string;
  declare tokenHash: string;
  declare expiresAt: Date;
  declare revokedAt: Date | null;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    EstimateLinkModel.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        companyId: { type: DataTypes.UUID, allowNull: false },
        estimateId: { type: DataTypes.UUID, allowNull: false },
        tokenHash: { type: DataTypes.CHAR(64), allowNull: false },
        expiresAt: { type: DataTypes.DATE(3), allowNull: false },
        revokedAt: { type: DataTypes.DATE(3), allowNull: true },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'estimate_links', underscored: true, updatedAt: false },
    );
  }
}
