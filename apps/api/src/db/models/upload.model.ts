import { DataTypes, Model } from 'sequelize';
import type {
  CreationOptional,
  InferAttributes,
  InferCreationAttributes,
  Sequelize,
} from 'sequelize';

/**
 * One stored file's metadata (migration 0017). The bytes live in the upload storage under
 * `storageKey`; `contentType` is the type read from the content when it was checked.
 */
export class UploadModel extends Model<
  InferAttributes<UploadModel>,
  InferCreationAttributes<UploadModel>
> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare kind: string;
  declare contentType: string;
  declare byteSize: number;
  declare sha256: string;
  declare storageKey: string;
  declare originalName: string;
  declare createdBy: string | null;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    UploadModel.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        companyId: { type: DataTypes.UUID, allowNull: false },
        kind: { type: DataTypes.STRING(40), allowNull: false },
        contentType: { type: DataTypes.STRING(80), allowNull: false },
        byteSize: { type: DataTypes.INTEGER, allowNull: false },
        sha256: { type: DataTypes.CHAR(64), allowNull: false },
        storageKey: { type: DataTypes.STRING(200), allowNull: false },
        originalName: { type: DataTypes.STRING(200), allowNull: false },
        createdBy: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'uploads', underscored: true, updatedAt: false },
    );
  }
}
