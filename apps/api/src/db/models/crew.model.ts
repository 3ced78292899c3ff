import { DataTypes, Model } from 'sequelize';
import type {
  CreationOptional,
  InferAttributes,
  InferCreationAttributes,
  Sequelize,
} from 'sequelize';

/** A crew (migration 0016): calendar colour key, working days (0 = Sunday), jobs a day. */
export class CrewModel extends Model<
  InferAttributes<CrewModel>,
  InferCreationAttributes<CrewModel>
> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare name: string;
  declare colour: string;
  declare workingDays: unknown;
  declare jobsPerDay: number;
  declare archivedAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    CrewModel.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        companyId: { type: DataTypes.UUID, allowNull: false },
        name: { type: DataTypes.STRING(60), allowNull: false },
        colour: { type: DataTypes.STRING(20), allowNull: false },
        workingDays: { type: DataTypes.JSON, allowNull: false },
        jobsPerDay: { type: DataTypes.INTEGER, allowNull: false },
        archivedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'crews', underscored: true },
    );
  }
}
