// Roll stock. `rolls` are rolls and remnants of a turf product in one dye lot; `held_ft` is the
// length jobs have reserved and not cut yet, kept on the row so a reservation checks and takes
// it under the roll's row lock, and the CHECK refuses any write that would hold more than is
// left. A job's reservation (`turf_reservations`, one per job and product) lists its pieces on
// rolls in `roll_allocations`. Children point at parents through (company_id, …) keys, so they
// can never cross companies (the scheme of 0004 and 0009). The turf product is kept by id and
// name without a foreign key: a price-book item may go while its rolls are still on the shelf.
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

export const rollStock: Migration = {
  name: '0013-roll-stock',
  async up({ context: qi }) {
    await qi.createTable('rolls', {
      ...tenantColumns,
      turf_product_id: { type: DataTypes.UUID, allowNull: false },
      turf_product_name: { type: DataTypes.STRING(120), allowNull: false },
      dye_lot: { type: DataTypes.STRING(60), allowNull: false },
      width_ft: { type: DataTypes.DOUBLE, allowNull: false },
      length_ft: { type: DataTypes.DOUBLE, allowNull: false },
      remaining_ft: { type: DataTypes.DOUBLE, allowNull: false },
      held_ft: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
      location: { type: DataTypes.STRING(120), allowNull: true },
      is_remnant: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
      source_job_id: { type: DataTypes.UUID, allowNull: true },
      received_on: { type: DataTypes.DATEONLY, allowNull: true },
      notes: { type: DataTypes.STRING(500), allowNull: true },
      archived_at: { type: DataTypes.DATE(3), allowNull: true },
      ...timestamps,
    });
    // A small tolerance: lengths are sums of feet held as doubles.
    await executeSql(
      qi.sequelize,
      `ALTER TABLE rolls
         ADD CONSTRAINT rolls_lengths_sane CHECK (
           width_ft > 0 AND remaining_ft >= 0 AND held_ft >= 0
           AND held_ft <= remaining_ft + 0.000001)`,
    );
    await qi.addIndex('rolls', ['company_id', 'id'], { unique: true, name: 'rolls_company_id' });
    await qi.addIndex('rolls', ['company_id', 'turf_product_id', 'dye_lot'], {
      name: 'rolls_company_product_lot',
    });

    await qi.createTable('turf_reservations', {
      ...tenantColumns,
      job_id: { type: DataTypes.UUID, allowNull: false },
      turf_product_id: { type: DataTypes.UUID, allowNull: false },
      turf_product_name: { type: DataTypes.STRING(120), allowNull: false },
      dye_lot: { type: DataTypes.STRING(60), allowNull: true },
      status: { type: DataTypes.STRING(10), allowNull: false },
      short_ft: { type: DataTypes.DOUBLE, allowNull: false },
      to_order: { type: DataTypes.JSON, allowNull: false },
      is_exhaustive: { type: DataTypes.BOOLEAN, allowNull: false },
      ...timestamps,
    });
    await qi.addIndex('turf_reservations', ['company_id', 'id'], {
      unique: true,
      name: 'turf_reservations_company_id',
    });
    await qi.addIndex('turf_reservations', ['company_id', 'job_id', 'turf_product_id'], {
      unique: true,
      name: 'turf_reservations_job_product',
    });

    await qi.createTable('roll_allocations', {
      ...tenantColumns,
      reservation_id: { type: DataTypes.UUID, allowNull: false },
      roll_id: { type: DataTypes.UUID, allowNull: false },
      area_id: { type: DataTypes.UUID, allowNull: false },
      area_name: { type: DataTypes.STRING(120), allowNull: false },
      piece: { type: DataTypes.INTEGER, allowNull: false },
      is_remnant: { type: DataTypes.BOOLEAN, allowNull: false },
      width_ft: { type: DataTypes.DOUBLE, allowNull: false },
      length_ft: { type: DataTypes.DOUBLE, allowNull: false },
      ...timestamps,
    });
    await qi.addIndex('roll_allocations', ['company_id', 'reservation_id'], {
      name: 'roll_allocations_reservation',
    });
    await qi.addIndex('roll_allocations', ['company_id', 'roll_id'], {
      name: 'roll_allocations_roll',
    });
    // Plain SQL: Sequelize 6's addConstraint types take a single referenced column only.
    await executeSql(
      qi.sequelize,
      `ALTER TABLE turf_reservations
         ADD CONSTRAINT turf_reservations_job_same_company
           FOREIGN KEY (company_id, job_id) REFERENCES jobs (company_id, id)`,
    );
    await executeSql(
      qi.sequelize,
      `ALTER TABLE roll_allocations
         ADD CONSTRAINT roll_allocations_reservation_same_company
           FOREIGN KEY (company_id, reservation_id) REFERENCES turf_reservations (company_id, id)
           ON DELETE CASCADE,
         ADD CONSTRAINT roll_allocations_roll_same_company
           FOREIGN KEY (company_id, roll_id) REFERENCES rolls (company_id, id)`,
    );
  },
  async down({ context: qi }) {
    await qi.dropTable('roll_allocations');
    await qi.dropTable('turf_reservations');
    await qi.dropTable('rolls');
  },
};
