// Every webhook event the payment processor delivered, recorded once by its id. The unique key
// is what makes a replayed or concurrently duplicated event change nothing: the row is written
// in the same transaction as the handler's effect (modules/processor/webhook.service.ts), so a
// second delivery waits on the key and then finds it taken. company_id is copied from the
// event's metadata for reading the log only; no key points at companies, because an event may
// name no company (or a company since deleted) and must still be acknowledged.
import { DataTypes } from 'sequelize';
import type { Migration } from './types.js';

export const processorEvents: Migration = {
  name: '0015-processor-events',
  async up({ context: qi }) {
    await qi.createTable('processor_events', {
      event_id: { type: DataTypes.STRING(255), primaryKey: true, allowNull: false },
      type: { type: DataTypes.STRING(100), allowNull: false },
      object_id: { type: DataTypes.STRING(255), allowNull: true },
      company_id: { type: DataTypes.UUID, allowNull: true },
      /** Whether a handler was registered for the type (unknown types are only recorded). */
      handled: { type: DataTypes.BOOLEAN, allowNull: false },
      event_created_at: { type: DataTypes.DATE(3), allowNull: false },
      received_at: { type: DataTypes.DATE(3), allowNull: false },
    });
    await qi.addIndex('processor_events', ['company_id', 'received_at'], {
      name: 'processor_events_company',
    });
  },
  async down({ context: qi }) {
    await qi.dropTable('processor_events');
  },
};
