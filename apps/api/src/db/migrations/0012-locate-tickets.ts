// Locate tickets (one-call / 811) of a job. The computed times are stored with a snapshot of the
// rule that gave them and its explanation, so a later change of rules or of the company's region
// or zone never changes a ticket already called in. The job is referenced through
// (company_id, job_id), so a ticket can never point at another company's job (as in 0004).
import { DataTypes } from 'sequelize';
import { executeSql } from '../sql.js';
import type { Migration } from './types.js';

export const locateTickets: Migration = {
  name: '0012-locate-tickets',
  async up({ context: qi }) {
    await qi.createTable('locate_tickets', {
      id: { type: DataTypes.UUID, primaryKey: true, allowNull: false },
      company_id: {
        type: DataTypes.UUID,
        allowNull: false,
        references: { model: 'companies', key: 'id' },
        onDelete: 'CASCADE',
      },
      job_id: { type: DataTypes.UUID, allowNull: false },
      number: { type: DataTypes.STRING(40), allowNull: false },
      called_at: { type: DataTypes.DATE(3), allowNull: false },
      earliest_dig_at: { type: DataTypes.DATE(3), allowNull: false },
      expires_at: { type: DataTypes.DATE(3), allowNull: false },
      latest_start_at: { type: DataTypes.DATE(3), allowNull: true },
      status: { type: DataTypes.STRING(12), allowNull: false },
      time_zone: { type: DataTypes.STRING(64), allowNull: false },
      rule: { type: DataTypes.JSON, allowNull: false },
      explanation: { type: DataTypes.TEXT, allowNull: false },
      created_at: { type: DataTypes.DATE(3), allowNull: false },
      updated_at: { type: DataTypes.DATE(3), allowNull: false },
    });
    await qi.addIndex('locate_tickets', ['company_id', 'id'], {
      unique: true,
      name: 'locate_tickets_company_id',
    });
    await qi.addIndex('locate_tickets', ['company_id', 'job_id', 'called_at'], {
      name: 'locate_tickets_job',
    });
    await executeSql(
      qi.sequelize,
      `ALTER TABLE locate_tickets
         ADD CONSTRAINT locate_tickets_job_same_company
           FOREIGN KEY (company_id, job_id) REFERENCES jobs (company_id, id)`,
    );
  },
  async down({ context: qi }) {
    await qi.dropTable('locate_tickets');
  },
};
