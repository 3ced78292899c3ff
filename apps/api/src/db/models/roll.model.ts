import { DataTypes, Model } from 'sequelize';
import type {
  CreationOptional,
  InferAttributes,
  InferCreationAttributes,
  Sequelize,
} from 'sequelize';

/**
 * A roll or remnant of one turf product and dye lot (migration 0013). `heldFt` is what jobs'
 * reservations hold and have not cut; the table's CHECK keeps it within `remainingFt`.
 */
export class RollModel extends Model<
  InferAttributes<RollModel>,
  InferCreationAttributes<RollModel>
> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare turfProductId: string;
  declare turfProductName: string;
  declare dyeLot: string;
  declare widthFt: number;
  declare lengthFt: number;
  declare remainingFt: number;
  declare heldFt: CreationOptional<number>;
  declare location: string | null;
  declare isRemnant: boolean;
  declare sourceJobId: string | null;
  declare receivedOn: string | null;
  declare notes: string | null;
  declare archivedAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    RollModel.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        companyId: { type: DataTypes.UUID, allowNull: false },
        turfProductId: { type: DataTypes.UUID, allowNull: false },
        turfProductName: { type: DataTypes.STRING(120), allowNull: false },
        dyeLot: { type: DataTypes.STRING(60), allowNull: false },
        widthFt: { type: DataTypes.DOUBLE, allowNull: false },
        lengthFt: { type: DataTypes.DOUBLE, allowNull: false },
        remainingFt: { type: DataTypes.DOUBLE, allowNull: false },
        heldFt: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
        location: { type: DataTypes.STRING(120), allowNull: true },
        isRemnant: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        sourceJobId: { type: DataTypes.UUID, allowNull: true },
        receivedOn: { type: DataTypes.DATEONLY, allowNull: true },
        notes: { type: DataTypes.STRING(500), allowNull: true },
        archivedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'rolls', underscored: true },
    );
  }
}
