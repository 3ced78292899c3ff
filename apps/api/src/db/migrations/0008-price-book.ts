// The price book (one row per turf product, material, labour rate, rental or disposal fee) and
// one row of estimating settings per company. Prices are integer millicents (see
// packages/shared/src/price-book.ts); rates are basis points.
import { DataTypes } from 'sequelize';
import type { Migration } from './types.js';

const id = { type: DataTypes.UUID, primaryKey: true, allowNull: false };
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

export const priceBook: Migration = {
  name: '0008-price-book',
  async up({ context: qi }) {
    await qi.createTable('price_book_items', {
      id,
      company_id: companyRef,
      kind: { type: DataTypes.STRING(20), allowNull: false },
      item_key: { type: DataTypes.STRING(60), allowNull: false },
      name: { type: DataTypes.STRING(120), allowNull: false },
      unit: { type: DataTypes.STRING(20), allowNull: false },
      pack_size: { type: DataTypes.DOUBLE, allowNull: true },
      price_millicents: { type: DataTypes.BIGINT, allowNull: false },
      attributes: { type: DataTypes.JSON, allowNull: false },
      is_starter: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
      ...timestamps,
    });
    await qi.addIndex('price_book_items', ['company_id', 'item_key'], {
      unique: true,
      name: 'price_book_items_company_key',
    });
    await qi.addIndex('price_book_items', ['company_id', 'kind', 'name'], {
      name: 'price_book_items_company_kind_name',
    });
    await qi.createTable('estimating_settings', {
      id,
      company_id: companyRef,
      takeoff_overrides: { type: DataTypes.JSON, allowNull: false },
      markup_basis_points: { type: DataTypes.INTEGER, allowNull: false },
      tax_rate_basis_points: { type: DataTypes.INTEGER, allowNull: false },
      deposit_rule: { type: DataTypes.JSON, allowNull: false },
      ...timestamps,
    });
    await qi.addIndex('estimating_settings', ['company_id'], {
      unique: true,
      name: 'estimating_settings_company',
    });
  },
  async down({ context: qi }) {
    await qi.dropTable('estimating_settings');
    await qi.dropTable('price_book_items');
  },
};
