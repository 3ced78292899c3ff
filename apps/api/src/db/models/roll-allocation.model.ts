import { DataTypes, Model } from 'sequelize';
import type {
  CreationOptional,
  InferAttributes,
  InferCreationAttributes,
  Sequelize,
} from 'sequelize';

/** One plan piece of a reservation, to be cut from one roll (migration 0013). */
export class RollAllocationModel extends Model<
  InferAttributes<RollAllocationModel>,
  InferCreationAttributes<RollAllocationModel>
> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare reservationId: string;
  declare rollId: string;
  declare areaId: string;
  declare areaName: string;
  /** Index into the area's plan pieces. */
  declare piece: number;
  declare isRemnant: boolean;
  declare widthFt: number;
  declare lengthFt: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    RollAllocationModel.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        companyId: { type: DataTypes.UUID, allowNull: false },
        reservationId: { type: DataTypes.UUID, allowNull: false },
        rollId: { type: DataTypes.UUID, allowNull: false },
        areaId: { type: DataTypes.UUID, allowNull: false },
        areaName: { type: DataTypes.STRING(120), allowNull: false },
        piece: { type: DataTypes.INTEGER, allowNull: false },
        isRemnant: { type: DataTypes.BOOLEAN, allowNull: false },
        widthFt: { type: DataTypes.DOUBLE, allowNull: false },
        lengthFt: { type: DataTypes.DOUBLE, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'roll_allocations', underscored: true },
    );
  }
}
