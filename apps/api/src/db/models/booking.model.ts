import { DataTypes, Model } from 'sequelize';
import type {
  CreationOptional,
  InferAttributes,
  InferCreationAttributes,
  Sequelize,
} from 'sequelize';

/**
 * A crew booked on a job (migration 0016) for the calendar days `startDate`…`endDate`
 * (inclusive, company zone). `version` goes up by one with every change.
 */
export class BookingModel extends Model<
  InferAttributes<BookingModel>,
  InferCreationAttributes<BookingModel>
> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare crewId: string;
  declare jobId: string;
  declare startDate: string;
  declare endDate: string;
  declare phase: string;
  declare notes: string | null;
  declare createdBy: string | null;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    BookingModel.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        companyId: { type: DataTypes.UUID, allowNull: false },
        crewId: { type: DataTypes.UUID, allowNull: false },
        jobId: { type: DataTypes.UUID, allowNull: false },
        startDate: { type: DataTypes.DATEONLY, allowNull: false },
        endDate: { type: DataTypes.DATEONLY, allowNull: false },
        phase: { type: DataTypes.STRING(20), allowNull: false },
        notes: { type: DataTypes.STRING(500), allowNull: true },
        createdBy: { type: DataTypes.UUID, allowNull: true },
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'bookings', underscored: true },
    );
  }
}
