import { DataTypes, Model } from 'sequelize';
import type {
  CreationOptional,
  InferAttributes,
  InferCreationAttributes,
  Sequelize,
} from 'sequelize';

/** The tenant. Not company-scoped itself. */
export class CompanyModel extends Model<
  InferAttributes<CompanyModel>,
  InferCreationAttributes<CompanyModel>
> {
  declare id: CreationOptional<string>;
  declare name: string;
  declare slug: string;
  declare address: string | null;
  declare timeZone: string;
  declare region: string | null;
  declare currency: CreationOptional<string>;
  declare measurementSystem: CreationOptional<'imperial' | 'metric'>;
  declare settings: CreationOptional<Record<string, unknown>>;
  /** Payment terms: days from issue to the due day (migration 0014). */
  declare invoiceDueDays: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    CompanyModel.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        name: { type: DataTypes.STRING(120), allowNull: false },
        slug: { type: DataTypes.STRING(140), allowNull: false, unique: true },
        address: { type: DataTypes.STRING(500), allowNull: true },
        timeZone: { type: DataTypes.STRING(64), allowNull: false },
        region: { type: DataTypes.STRING(8), allowNull: true },
        currency: { type: DataTypes.CHAR(3), allowNull: false, defaultValue: 'USD' },
        measurementSystem: {
          type: DataTypes.STRING(8),
          allowNull: false,
          defaultValue: 'imperial',
        },
        settings: { type: DataTypes.JSON, allowNull: false, defaultValue: {} },
        invoiceDueDays: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 14 },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'companies', underscored: true },
    );
  }
}
