import { DataTypes, Model } from 'sequelize';
import type {
  CreationOptional,
  InferAttributes,
  InferCreationAttributes,
  NonAttribute,
  Sequelize,
} from 'sequelize';
import type { JobStatus } from '@seamwright/domain';
import type { CustomerModel } from './customer.model.js';
import type { SiteModel } from './site.model.js';

/** One customer's work at one of their sites; `status` follows the lifecycle in @seamwright/domain. */
export class JobModel extends Model<InferAttributes<JobModel>, InferCreationAttributes<JobModel>> {
  declare id: CreationOptional<string>;
  declare companyId: string;
  declare customerId: string;
  declare siteId: string;
  declare title: string;
  declare status: JobStatus;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  /** Filled only when a find includes them (the list and the job page). */
  declare customer?: NonAttribute<CustomerModel>;
  declare site?: NonAttribute<SiteModel>;

  static initModel(sequelize: Sequelize): void {
    JobModel.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        companyId: { type: DataTypes.UUID, allowNull: false },
        customerId: { type: DataTypes.UUID, allowNull: false },
        siteId: { type: DataTypes.UUID, allowNull: false },
        title: { type: DataTypes.STRING(200), allowNull: false },
        status: { type: DataTypes.STRING(20), allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'jobs', underscored: true },
    );
  }
}
