// Areas of a job with their saved plans. An area points at its job through (company_id,
// job_id) → jobs (company_id, id), so it can never hang under another company's job (the same
// scheme as 0004 and 0007). The plan is stored with the exact planner request and the engine
// version, so an old estimate can be traced and planned again. The turf product is kept as a
// snapshot in `turf_product` (no foreign key): a price-book item may change or go without
// changing a plan that was priced from it.
import { DataTypes } from 'sequelize';
import { executeSql } from '../sql.js';
import type { Migration } from './types.js';

export const jobAreas: Migration = {
  name: '0009-job-areas',
  async up({ context: qi }) {
    // The parent key the area's (company, job) pair points at.
    await qi.addIndex('jobs', ['company_id', 'id'], { unique: true, name: 'jobs_company_id_id' });
    await qi.createTable('job_areas', {
      id: { type: DataTypes.UUID, primaryKey: true, allowNull: false },
      company_id: {
        type: DataTypes.UUID,
        allowNull: false,
        references: { model: 'companies', key: 'id' },
        onDelete: 'CASCADE',
      },
      job_id: { type: DataTypes.UUID, allowNull: false },
      name: { type: DataTypes.STRING(120), allowNull: false },
      // `usage` is a reserved word in MariaDB.
      area_usage: { type: DataTypes.STRING(20), allowNull: false },
      turf_product_id: { type: DataTypes.UUID, allowNull: true },
      turf_product: { type: DataTypes.JSON, allowNull: true },
      base_depth_in: { type: DataTypes.DOUBLE, allowNull: true },
      grain_choice: { type: DataTypes.JSON, allowNull: false },
      /** The planner fields as sent (area, roll, edges, …), for PATCH to change one of them. */
      input: { type: DataTypes.JSON, allowNull: false },
      /** Exactly what the planner was given for `plan`. */
      request: { type: DataTypes.JSON, allowNull: false },
      plan: { type: DataTypes.JSON, allowNull: false },
      alternatives: { type: DataTypes.JSON, allowNull: false },
      engine_version: { type: DataTypes.STRING(40), allowNull: false },
      area_sq_ft: { type: DataTypes.DOUBLE, allowNull: false },
      ordered_sq_ft: { type: DataTypes.DOUBLE, allowNull: false },
      created_at: { type: DataTypes.DATE(3), allowNull: false },
      updated_at: { type: DataTypes.DATE(3), allowNull: false },
    });
    // Plain SQL: Sequelize 6's addConstraint types take a single referenced column only.
    await executeSql(
      qi.sequelize,
      `ALTER TABLE job_areas
         ADD CONSTRAINT job_areas_job_same_company
           FOREIGN KEY (company_id, job_id) REFERENCES jobs (company_id, id)`,
    );
    await qi.addIndex('job_areas', ['company_id', 'job_id', 'created_at'], {
      name: 'job_areas_company_job',
    });
  },
  async down({ context: qi }) {
    await qi.dropTable('job_areas');
    await qi.removeIndex('jobs', 'jobs_company_id_id');
  },
};
