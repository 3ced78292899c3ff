import { DataTypes, Model } from 'sequelize';
import type {
  CreationOptional,
  InferAttributes,
  InferCreationAttributes,
  Sequelize,
} from 'sequelize';

/** One person on a crew (migration 0016): a member's account (`userId`) or a helper's `name`. */
export class CrewMemberModel extends Model<
  InferAttributes<CrewMemberModel>,
  InferCreationAttributes<CrewMemberModel>
> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare crewId: string;
  declare userId: string | null;
  declare name: string | null;
  declare position: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    CrewMemberModel.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        companyId: { type: DataTypes.UUID, allowNull: false },
        crewId: { type: DataTypes.UUID, allowNull: false },
        userId: { type: DataTypes.UUID, allowNull: true },
        name: { type: DataTypes.STRING(80), allowNull: true },
        position: { type: DataTypes.INTEGER, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'crew_members', underscored: true },
    );
  }
}
