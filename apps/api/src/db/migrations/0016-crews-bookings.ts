// Crews and their bookings. `crews` carry their calendar colour (a key of the palette in
// @seamwright/shared), working days (JSON list, 0 = Sunday) and jobs a day; `crew_members` are
// crew-lead members (by their membership's (company_id, user_id), so a person removed from the
// company leaves the crew with it) or named helpers with no account; `bookings` put a crew on a
// job for an inclusive range of calendar days in the company's zone, with a phase and a
// version for optimistic concurrency. Children point at parents through (company_id, …) keys
// (the scheme of 0004, 0010 and 0013), so no row can reach into another company.
import { DataTypes } from 'sequelize';
import { executeSql } from '../sql.js';
import type { Migration } from './types.js';

const tenantColumns = {
  id: { type: DataTypes.UUID, primaryKey: true, allowNull: false },
  company_id: {
    type: DataTypes.UUID,
    allowNull: false,
    references: { model: 'companies', key: 'id' },
    onDelete: 'CASCADE',
  },
} as const;

const timestamps = {
  created_at: { type: DataTypes.DATE(3), allowNull: false },
  updated_at: { type: DataTypes.DATE(3), allowNull: false },
} as const;

export const crewsBookings: Migration = {
  name: '0016-crews-bookings',
  async up({ context: qi }) {
    await qi.createTable('crews', {
      ...tenantColumns,
      name: { type: DataTypes.STRING(60), allowNull: false },
      colour: { type: DataTypes.STRING(20), allowNull: false },
      working_days: { type: DataTypes.JSON, allowNull: false },
      jobs_per_day: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
      archived_at: { type: DataTypes.DATE(3), allowNull: true },
      ...timestamps,
    });
    await qi.addIndex('crews', ['company_id', 'id'], { unique: true, name: 'crews_company_id' });
    await qi.addIndex('crews', ['company_id', 'name'], { name: 'crews_company_name' });
    await executeSql(
      qi.sequelize,
      'ALTER TABLE crews ADD CONSTRAINT crews_jobs_per_day CHECK (jobs_per_day BETWEEN 1 AND 5)',
    );

    await qi.createTable('crew_members', {
      ...tenantColumns,
      crew_id: { type: DataTypes.UUID, allowNull: false },
      user_id: { type: DataTypes.UUID, allowNull: true },
      name: { type: DataTypes.STRING(80), allowNull: true },
      position: { type: DataTypes.INTEGER, allowNull: false },
      ...timestamps,
    });
    await qi.addIndex('crew_members', ['company_id', 'crew_id', 'user_id'], {
      unique: true,
      name: 'crew_members_crew_user',
    });
    await qi.addIndex('crew_members', ['company_id', 'user_id'], { name: 'crew_members_user' });
    await executeSql(
      qi.sequelize,
      `ALTER TABLE crew_members
         ADD CONSTRAINT crew_members_who CHECK ((user_id IS NULL) <> (name IS NULL)),
         ADD CONSTRAINT crew_members_crew_same_company
           FOREIGN KEY (company_id, crew_id) REFERENCES crews (company_id, id) ON DELETE CASCADE,
         ADD CONSTRAINT crew_members_membership_same_company
           FOREIGN KEY (company_id, user_id) REFERENCES memberships (company_id, user_id)
           ON DELETE CASCADE`,
    );

    await qi.createTable('bookings', {
      ...tenantColumns,
      crew_id: { type: DataTypes.UUID, allowNull: false },
      job_id: { type: DataTypes.UUID, allowNull: false },
      start_date: { type: DataTypes.DATEONLY, allowNull: false },
      end_date: { type: DataTypes.DATEONLY, allowNull: false },
      phase: { type: DataTypes.STRING(20), allowNull: false },
      notes: { type: DataTypes.STRING(500), allowNull: true },
      created_by: {
        type: DataTypes.UUID,
        allowNull: true,
        references: { model: 'users', key: 'id' },
        onDelete: 'SET NULL',
      },
      version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
      ...timestamps,
    });
    await qi.addIndex('bookings', ['company_id', 'id'], {
      unique: true,
      name: 'bookings_company_id',
    });
    await qi.addIndex('bookings', ['company_id', 'crew_id', 'start_date'], {
      name: 'bookings_company_crew_start',
    });
    await qi.addIndex('bookings', ['company_id', 'start_date'], {
      name: 'bookings_company_start',
    });
    await qi.addIndex('bookings', ['company_id', 'job_id'], { name: 'bookings_company_job' });
    await executeSql(
      qi.sequelize,
      `ALTER TABLE bookings
         ADD CONSTRAINT bookings_days_in_order CHECK (end_date >= start_date),
         ADD CONSTRAINT bookings_crew_same_company
           FOREIGN KEY (company_id, crew_id) REFERENCES crews (company_id, id),
         ADD CONSTRAINT bookings_job_same_company
           FOREIGN KEY (company_id, job_id) REFERENCES jobs (company_id, id)`,
    );
  },
  async down({ context: qi }) {
    await qi.dropTable('bookings');
    await qi.dropTable('crew_members');
    await qi.dropTable('crews');
  },
};
