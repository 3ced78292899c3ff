import { DataTypes, Model } from 'sequelize';
import type {
  CreationOptional,
  InferAttributes,
  InferCreationAttributes,
  Sequelize,
} from 'sequelize';

/** An append-only record of who changed what in a company. */
export class AuditEventModel extends Model<
  InferAttributes<AuditEventModel>,
  InferCreationAttributes<AuditEventModel>
> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare userId: string | null;
  declare action: string;
  declare entity: string;
  declare entityId: string | null;
  declare data: Record<string, unknown> | null;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    AuditEventModel.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        companyId: { type: DataTypes.UUID, allowNull: false },
        userId: { type: DataTypes.UUID, allowNull: true },
        action: { type: DataTypes.STRING(60), allowNull: false },
        entity: { type: DataTypes.STRING(40), allowNull: false },
        entityId: { type: DataTypes.UUID, allowNull: true },
        data: { type: DataTypes.JSON, allowNull: true },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'audit_events', underscored: true, updatedAt: false },
    );
  }
}
