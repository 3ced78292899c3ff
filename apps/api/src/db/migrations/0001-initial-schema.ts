// Companies, users, memberships, invitations, password resets, customers, sites, audit events
// and the session store's table. Every tenant table leads an index with company_id.
import { DataTypes } from 'sequelize';
import type { Migration } from './types.js';

const id = { type: DataTypes.UUID, primaryKey: true, allowNull: false };
// Millisecond precision so "newest first" lists order events made within one second.
const timestamps = {
  created_at: { type: DataTypes.DATE(3), allowNull: false },
  updated_at: { type: DataTypes.DATE(3), allowNull: false },
};
const companyRef = {
  type: DataTypes.UUID,
  allowNull: false,
  references: { model: 'companies', key: 'id' },
  onDelete: 'CASCADE',
};
const userRef = {
  type: DataTypes.UUID,
  allowNull: false,
  references: { model: 'users', key: 'id' },
  onDelete: 'CASCADE',
};

export const initialSchema: Migration = {
  name: '0001-initial-schema',
  async up({ context: qi }) {
    await qi.createTable('companies', {
      id,
      name: { type: DataTypes.STRING(120), allowNull: false },
      slug: { type: DataTypes.STRING(140), allowNull: false, unique: true },
      address: { type: DataTypes.STRING(500), allowNull: true },
      time_zone: { type: DataTypes.STRING(64), allowNull: false },
      region: { type: DataTypes.STRING(8), allowNull: true },
      currency: { type: DataTypes.CHAR(3), allowNull: false, defaultValue: 'USD' },
      measurement_system: { type: DataTypes.STRING(8), allowNull: false, defaultValue: 'imperial' },
      settings: { type: DataTypes.JSON, allowNull: false },
      ...timestamps,
    });
    await qi.createTable('users', {
      id,
      name: { type: DataTypes.STRING(120), allowNull: false },
      email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
      password_hash: { type: DataTypes.STRING(100), allowNull: false },
      ...timestamps,
    });
    await qi.createTable('memberships', {
      id,
      company_id: companyRef,
      user_id: userRef,
      role: { type: DataTypes.STRING(20), allowNull: false },
      ...timestamps,
    });
    await qi.addIndex('memberships', ['company_id', 'user_id'], {
      unique: true,
      name: 'memberships_company_user',
    });
    await qi.addIndex('memberships', ['user_id'], { name: 'memberships_user' });

    await qi.createTable('invitations', {
      id,
      company_id: companyRef,
      email: { type: DataTypes.STRING(254), allowNull: false },
      role: { type: DataTypes.STRING(20), allowNull: false },
      token_hash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
      expires_at: { type: DataTypes.DATE, allowNull: false },
      accepted_at: { type: DataTypes.DATE, allowNull: true },
      invited_by: {
        type: DataTypes.UUID,
        allowNull: true,
        references: { model: 'users', key: 'id' },
        onDelete: 'SET NULL',
      },
      ...timestamps,
    });
    await qi.addIndex('invitations', ['company_id', 'email'], {
      name: 'invitations_company_email',
    });

    await qi.createTable('password_resets', {
      id,
      user_id: userRef,
      token_hash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
      expires_at: { type: DataTypes.DATE, allowNull: false },
      used_at: { type: DataTypes.DATE, allowNull: true },
      created_at: { type: DataTypes.DATE(3), allowNull: false },
    });

    await qi.createTable('customers', {
      id,
      company_id: companyRef,
      name: { type: DataTypes.STRING(200), allowNull: false },
      email: { type: DataTypes.STRING(254), allowNull: true },
      phone: { type: DataTypes.STRING(40), allowNull: true },
      billing_address: { type: DataTypes.STRING(500), allowNull: true },
      notes: { type: DataTypes.TEXT, allowNull: true },
      archived_at: { type: DataTypes.DATE, allowNull: true },
      ...timestamps,
    });
    await qi.addIndex('customers', ['company_id', 'name'], { name: 'customers_company_name' });
    await qi.addIndex('customers', ['company_id', 'created_at'], {
      name: 'customers_company_created',
    });

    await qi.createTable('sites', {
      id,
      company_id: companyRef,
      customer_id: {
        type: DataTypes.UUID,
        allowNull: false,
        references: { model: 'customers', key: 'id' },
        onDelete: 'CASCADE',
      },
      label: { type: DataTypes.STRING(120), allowNull: true },
      address_line1: { type: DataTypes.STRING(200), allowNull: false },
      address_line2: { type: DataTypes.STRING(200), allowNull: true },
      city: { type: DataTypes.STRING(120), allowNull: false },
      region: { type: DataTypes.STRING(60), allowNull: true },
      postal_code: { type: DataTypes.STRING(20), allowNull: true },
      access_notes: { type: DataTypes.TEXT, allowNull: true },
      pets: { type: DataTypes.STRING(500), allowNull: true },
      hazards: { type: DataTypes.TEXT, allowNull: true },
      sprinkler_heads: { type: DataTypes.INTEGER, allowNull: true },
      ...timestamps,
    });
    await qi.addIndex('sites', ['company_id', 'customer_id'], { name: 'sites_company_customer' });

    await qi.createTable('audit_events', {
      id,
      company_id: companyRef,
      user_id: { type: DataTypes.UUID, allowNull: true },
      action: { type: DataTypes.STRING(60), allowNull: false },
      entity: { type: DataTypes.STRING(40), allowNull: false },
      entity_id: { type: DataTypes.UUID, allowNull: true },
      data: { type: DataTypes.JSON, allowNull: true },
      created_at: { type: DataTypes.DATE(3), allowNull: false },
    });
    await qi.addIndex('audit_events', ['company_id', 'created_at'], {
      name: 'audit_events_company_created',
    });

    await qi.createTable('sessions', {
      sid: { type: DataTypes.STRING(64), primaryKey: true, allowNull: false },
      user_id: { type: DataTypes.UUID, allowNull: true },
      expires: { type: DataTypes.DATE, allowNull: true },
      data: { type: DataTypes.TEXT, allowNull: true },
      ...timestamps,
    });
    await qi.addIndex('sessions', ['user_id'], { name: 'sessions_user' });
    await qi.addIndex('sessions', ['expires'], { name: 'sessions_expires' });
  },
  async down({ context: qi }) {
    for (const table of [
      'sessions',
      'audit_events',
      'sites',
      'customers',
      'password_resets',
      'invitations',
      'memberships',
      'users',
      'companies',
    ]) {
      await qi.dropTable(table);
    }
  },
};
