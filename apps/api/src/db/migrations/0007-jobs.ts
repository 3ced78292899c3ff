// Jobs: one customer's work at one of their sites, moving along the lifecycle in
// @seamwright/domain. The keys make the database refuse a job whose customer or site belongs to
// another company, or whose site belongs to another customer (the same scheme as 0004). A
// customer or site with jobs cannot be deleted (RESTRICT): jobs will carry estimates and
// money, so the API answers 409 and the customer is archived instead.
import { DataTypes } from 'sequelize';
import { executeSql } from '../sql.js';
import type { Migration } from './types.js';

export const jobs: Migration = {
  name: '0007-jobs',
  async up({ context: qi }) {
    // The parent key the job's (company, customer, site) triple points at.
    await qi.addIndex('sites', ['company_id', 'customer_id', 'id'], {
      unique: true,
      name: 'sites_company_customer_id',
    });
    await qi.createTable('jobs', {
      id: { type: DataTypes.UUID, primaryKey: true, allowNull: false },
      company_id: {
        type: DataTypes.UUID,
        allowNull: false,
        references: { model: 'companies', key: 'id' },
        onDelete: 'CASCADE',
      },
      customer_id: { type: DataTypes.UUID, allowNull: false },
      site_id: { type: DataTypes.UUID, allowNull: false },
      title: { type: DataTypes.STRING(200), allowNull: false },
      status: { type: DataTypes.STRING(20), allowNull: false },
      created_at: { type: DataTypes.DATE(3), allowNull: false },
      updated_at: { type: DataTypes.DATE(3), allowNull: false },
    });
    // Plain SQL: Sequelize 6's addConstraint types take a single referenced column only.
    await executeSql(
      qi.sequelize,
      `ALTER TABLE jobs
         ADD CONSTRAINT jobs_customer_same_company
           FOREIGN KEY (company_id, customer_id) REFERENCES customers (company_id, id),
         ADD CONSTRAINT jobs_site_same_customer
           FOREIGN KEY (company_id, customer_id, site_id)
           REFERENCES sites (company_id, customer_id, id)`,
    );
    // The list's orders and filters (company first), the status filter, and a customer's jobs.
    await qi.addIndex('jobs', ['company_id', 'created_at'], { name: 'jobs_company_created' });
    await qi.addIndex('jobs', ['company_id', 'updated_at'], { name: 'jobs_company_updated' });
    await qi.addIndex('jobs', ['company_id', 'title'], { name: 'jobs_company_title' });
    await qi.addIndex('jobs', ['company_id', 'status', 'created_at'], {
      name: 'jobs_company_status_created',
    });
    await qi.addIndex('jobs', ['company_id', 'customer_id'], { name: 'jobs_company_customer' });
    await qi.addIndex('jobs', ['company_id', 'site_id'], { name: 'jobs_company_site' });
    // A job's activity: its audit events, newest first.
    await qi.addIndex('audit_events', ['company_id', 'entity', 'entity_id', 'created_at'], {
      name: 'audit_events_company_entity',
    });
  },
  async down({ context: qi }) {
    await qi.removeIndex('audit_events', 'audit_events_company_entity');
    await qi.dropTable('jobs');
    await qi.removeIndex('sites', 'sites_company_customer_id');
  },
};
