import { DataTypes, Model } from 'sequelize';
import type {
  CreationOptional,
  InferAttributes,
  InferCreationAttributes,
  Sequelize,
} from 'sequelize';

/**
 * A job's locate ticket (migration 0012): the times computed when it was called in, the rule
 * snapshot (`rule`, JSON) and its explanation. `status` is what the office recorded; `expired`
 * is computed from `expiresAt` when read.
 */
export class LocateTicketModel extends Model<
  InferAttributes<LocateTicketModel>,
  InferCreationAttributes<LocateTicketModel>
> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare jobId: string;
  declare number: string;
  declare calledAt: Date;
  declare earliestDigAt: Date;
  declare expiresAt: Date;
  declare latestStartAt: Date | null;
  declare status: string;
  declare timeZone: string;
  declare rule: unknown;
  declare explanation: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    LocateTicketModel.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        companyId: { type: DataTypes.UUID, allowNull: false },
        jobId: { type: DataTypes.UUID, allowNull: false },
        number: { type: DataTypes.STRING(40), allowNull: false },
        calledAt: { type: DataTypes.DATE(3), allowNull: false },
        earliestDigAt: { type: DataTypes.DATE(3), allowNull: false },
        expiresAt: { type: DataTypes.DATE(3), allowNull: false },
        latestStartAt: { type: DataTypes.DATE(3), allowNull: true },
        status: { type: DataTypes.STRING(12), allowNull: false },
        timeZone: { type: DataTypes.STRING(64), allowNull: false },
        rule: { type: DataTypes.JSON, allowNull: false },
        explanation: { type: DataTypes.TEXT, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'locate_tickets', underscored: true },
    );
  }
}
