import { DataTypes, Model } from 'sequelize';
import type {
  CreationOptional,
  InferAttributes,
  InferCreationAttributes,
  Sequelize,
} from 'sequelize';

/**
 * One area of a job with its saved plan (migration 0009). The JSON columns hold the planner's
 * request and plan as they were computed; `engineVersion` names the planner that made them.
 */
export class JobAreaModel extends Model<
  InferAttributes<JobAreaModel>,
  InferCreationAttributes<JobAreaModel>
> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare jobId: string;
  declare name: string;
  declare usage: string;
  declare turfProductId: string | null;
  declare turfProduct: unknown;
  declare baseDepthIn: number | null;
  declare grainChoice: unknown;
  declare input: unknown;
  declare request: unknown;
  declare plan: unknown;
  declare alternatives: unknown;
  declare engineVersion: string;
  declare areaSqFt: number;
  declare orderedSqFt: number;
  /** The photo or sketch under the drawing (migration 0017), and its scale and placement. */
  declare underlayUploadId: CreationOptional<string | null>;
  declare underlay: CreationOptional<object | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    JobAreaModel.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        companyId: { type: DataTypes.UUID, allowNull: false },
        jobId: { type: DataTypes.UUID, allowNull: false },
        name: { type: DataTypes.STRING(120), allowNull: false },
        // `usage` is a reserved word in MariaDB, hence the column name.
        usage: { type: DataTypes.STRING(20), allowNull: false, field: 'area_usage' },
        turfProductId: { type: DataTypes.UUID, allowNull: true },
        turfProduct: { type: DataTypes.JSON, allowNull: true },
        baseDepthIn: { type: DataTypes.DOUBLE, allowNull: true },
        grainChoice: { type: DataTypes.JSON, allowNull: false },
        input: { type: DataTypes.JSON, allowNull: false },
        request: { type: DataTypes.JSON, allowNull: false },
        plan: { type: DataTypes.JSON, allowNull: false },
        alternatives: { type: DataTypes.JSON, allowNull: false },
        engineVersion: { type: DataTypes.STRING(40), allowNull: false },
        areaSqFt: { type: DataTypes.DOUBLE, allowNull: false },
        orderedSqFt: { type: DataTypes.DOUBLE, allowNull: false },
        underlayUploadId: { type: DataTypes.UUID, allowNull: true },
        underlay: { type: DataTypes.JSON, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'job_areas', underscored: true },
    );
  }
}
