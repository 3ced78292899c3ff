import { DataTypes, Model } from 'sequelize';
import type {
  CreationOptional,
  InferAttributes,
  InferCreationAttributes,
  Sequelize,
} from 'sequelize';

/** A place where work happens, belonging to one customer. */
export class SiteModel extends Model<
  InferAttributes<SiteModel>,
  InferCreationAttributes<SiteModel>
> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare customerId: string;
  declare label: string | null;
  declare addressLine1: string;
  declare addressLine2: string | null;
  declare city: string;
  declare region: string | null;
  declare postalCode: string | null;
  declare accessNotes: string | null;
  declare pets: string | null;
  declare hazards: string | null;
  declare sprinklerHeads: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    SiteModel.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        companyId: { type: DataTypes.UUID, allowNull: false },
        customerId: { type: DataTypes.UUID, allowNull: false },
        label: { type: DataTypes.STRING(120), allowNull: true },
        addressLine1: { type: DataTypes.STRING(200), allowNull: false },
        addressLine2: { type: DataTypes.STRING(200), allowNull: true },
        city: { type: DataTypes.STRING(120), allowNull: false },
        region: { type: DataTypes.STRING(60), allowNull: true },
        postalCode: { type: DataTypes.STRING(20), allowNull: true },
        accessNotes: { type: DataTypes.TEXT, allowNull: true },
        pets: { type: DataTypes.STRING(500), allowNull: true },
        hazards: { type: DataTypes.TEXT, allowNull: true },
        sprinklerHeads: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'sites', underscored: true },
    );
  }
}
