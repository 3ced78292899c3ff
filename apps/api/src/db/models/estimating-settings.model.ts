import { DataTypes, Model } from 'sequelize';
import type {
  CreationOptional,
  InferAttributes,
  InferCreationAttributes,
  Sequelize,
} from 'sequelize';

/** A company's estimating settings: takeoff overrides only (never the full defaults). */
export class EstimatingSettingsModel extends Model<
  InferAttributes<EstimatingSettingsModel>,
  InferCreationAttributes<EstimatingSettingsModel>
> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare takeoffOverrides: unknown;
  declare markupBasisPoints: number;
  declare taxRateBasisPoints: number;
  declare depositRule: unknown;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    EstimatingSettingsModel.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        companyId: { type: DataTypes.UUID, allowNull: false },
        takeoffOverrides: { type: DataTypes.JSON, allowNull: false },
        markupBasisPoints: { type: DataTypes.INTEGER, allowNull: false },
        taxRateBasisPoints: { type: DataTypes.INTEGER, allowNull: false },
        depositRule: { type: DataTypes.JSON, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'estimating_settings', underscored: true },
    );
  }
}
