import { DataTypes, Model } from 'sequelize';
import type {
  CreationOptional,
  InferAttributes,
  InferCreationAttributes,
  Sequelize,
} from 'sequelize';

/** A job's turf of one product reserved on rolls of one dye lot (migration 0013). */
export class TurfReservationModel extends Model<
  InferAttributes<TurfReservationModel>,
  InferCreationAttributes<TurfReservationModel>
> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare jobId: string;
  declare turfProductId: string;
  declare turfProductName: string;
  declare dyeLot: string | null;
  /** `held` until the crew cuts it (the job goes in progress), then `cut`. */
  declare status: string;
  declare shortFt: number;
  declare toOrder: unknown;
  declare isExhaustive: boolean;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    TurfReservationModel.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        companyId: { type: DataTypes.UUID, allowNull: false },
        jobId: { type: DataTypes.UUID, allowNull: false },
        turfProductId: { type: DataTypes.UUID, allowNull: false },
        turfProductName: { type: DataTypes.STRING(120), allowNull: false },
        dyeLot: { type: DataTypes.STRING(60), allowNull: true },
        status: { type: DataTypes.STRING(10), allowNull: false },
        shortFt: { type: DataTypes.DOUBLE, allowNull: false },
        toOrder: { type: DataTypes.JSON, allowNull: false },
        isExhaustive: { type: DataTypes.BOOLEAN, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'turf_reservations', underscored: true },
    );
  }
}
