import { DataTypes, Model } from 'sequelize';
import type {
  CreationOptional,
  InferAttributes,
  InferCreationAttributes,
  Sequelize,
} from 'sequelize';

/** A company's payment-reminder schedule and wording (migration 0019). */
export class ReminderSettingsModel extends Model<
  InferAttributes<ReminderSettingsModel>,
  InferCreationAttributes<ReminderSettingsModel>
> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare enabled: boolean;
  declare offsets: unknown;
  declare senderName: string | null;
  declare templates: unknown;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    ReminderSettingsModel.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        companyId: { type: DataTypes.UUID, allowNull: false },
        enabled: { type: DataTypes.BOOLEAN, allowNull: false },
        offsets: { type: DataTypes.JSON, allowNull: false },
        senderName: { type: DataTypes.STRING(120), allowNull: true },
        templates: { type: DataTypes.JSON, allowNull: false },
        createdAt: DataTypes.DATE(3),
        updatedAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'reminder_settings', underscored: true },
    );
  }
}
