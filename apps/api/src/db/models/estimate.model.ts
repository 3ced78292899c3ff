import { DataTypes, Model } from 'sequelize';
import type {
  CreationOptional,
  InferAttributes,
  InferCreationAttributes,
  Sequelize,
} from 'sequelize';

/**
 * One version of a job's estimate (migration 0010). `tiers` holds every tier with its lines
 * and totals; the money columns cache the first tier's totals (the repository reads BIGINT
 * back through Number(): cents stay far below 2^53).
 */
export class EstimateModel extends Model<
  InferAttributes<EstimateModel>,
  InferCreationAttributes<EstimateModel>
> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare jobId: string;
  declare version: number;
  declare status: string;
  declare tiers: unknown;
  declare chosenTierId: string | null;
  declare warnings: unknown;
  declare notes: string | null;
  declare validUntil: string | null;
  declare markupBasisPoints: number;
  declare taxRateBasisPoints: number;
  declare depositRule: unknown;
  declare subtotalCents: number;
  declare taxCents: number;
  declare totalCents: number;
  declare depositCents: number;
  declare sentAt: Date | null;
  declare createdBy: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    EstimateModel.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        companyId: { type: DataTypes.UUID, allowNull: false },
        jobId: { type: DataTypes.UUID, allowNull: false },
        version: { type: DataTypes.INTEGER, allowNull: false },
        status: { type: DataTypes.STRING(20), allowNull: false },
        tiers: { type: DataTypes.JSON, allowNull: false },
        chosenTierId: { type: DataTypes.STRING(36), allowNull: true },
        warnings: { type: DataTypes.JSON, allowNull: false },
        notes: { type: DataTypes.TEXT, allowNull: true },
        validUntil: { type: DataTypes.DATEONLY, allowNull: true },
        markupBasisPoints: { type: DataTypes.INTEGER, allowNull: false },
        taxRateBasisPoints: { type: DataTypes.INTEGER, allowNull: false },
        depositRule: { type: DataTypes.JSON, allowNull: false },
        subtotalCents: { type: DataTypes.BIGINT, allowNull: false },
        taxCents: { type: DataTypes.BIGINT, allowNull: false },
        totalCents: { type: DataTypes.BIGINT, allowNull: false },
        depositCents: { type: DataTypes.BIGINT, allowNull: false },
        sentAt: { type: DataTypes.DATE(3), allowNull: true },
        createdBy: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'estimates', underscored: true },
    );
  }
}
