// Uploaded files (photos and sketches): one metadata row per stored file, the bytes in the
// storage behind `storage_key` (modules/uploads). Generic on purpose: area underlays use it now,
// crew photos later. `(company_id, id)` is the parent key other tables point at (as in 0004), so
// an area can never show another company's file. An area's underlay is two columns on
// job_areas: the upload it shows and its scale and placement (JSON).
import { DataTypes } from 'sequelize';
import { executeSql } from '../sql.js';
import type { Migration } from './types.js';

export const uploads: Migration = {
  name: '0017-uploads',
  async up({ context: qi }) {
    await qi.createTable('uploads', {
      id: { type: DataTypes.UUID, primaryKey: true, allowNull: false },
      company_id: {
        type: DataTypes.UUID,
        allowNull: false,
        references: { model: 'companies', key: 'id' },
        onDelete: 'CASCADE',
      },
      /** What the file is for (`area-underlay`, later `job-photo`). */
      kind: { type: DataTypes.STRING(40), allowNull: false },
      /** The type read from the content, never the one the browser sent. */
      content_type: { type: DataTypes.STRING(80), allowNull: false },
      byte_size: { type: DataTypes.INTEGER, allowNull: false },
      sha256: { type: DataTypes.CHAR(64), allowNull: false },
      storage_key: { type: DataTypes.STRING(200), allowNull: false },
      original_name: { type: DataTypes.STRING(200), allowNull: false },
      // No foreign key: like audit events, the row keeps who uploaded it as history.
      created_by: { type: DataTypes.UUID, allowNull: true },
      created_at: { type: DataTypes.DATE(3), allowNull: false },
    });
    await qi.addIndex('uploads', ['company_id', 'id'], {
      unique: true,
      name: 'uploads_company_id_id',
    });
    await qi.addIndex('uploads', ['storage_key'], { unique: true, name: 'uploads_storage_key' });
    await qi.addColumn('job_areas', 'underlay_upload_id', {
      type: DataTypes.UUID,
      allowNull: true,
    });
    await qi.addColumn('job_areas', 'underlay', { type: DataTypes.JSON, allowNull: true });
    await executeSql(
      qi.sequelize,
      `ALTER TABLE job_areas
         ADD CONSTRAINT job_areas_underlay_same_company
           FOREIGN KEY (company_id, underlay_upload_id) REFERENCES uploads (company_id, id)`,
    );
  },
  async down({ context: qi }) {
    await qi.removeConstraint('job_areas', 'job_areas_underlay_same_company');
    await qi.removeColumn('job_areas', 'underlay');
    await qi.removeColumn('job_areas', 'underlay_upload_id');
    await qi.dropTable('uploads');
  },
};
