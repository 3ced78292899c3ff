// The processor_events table (migration 0015): one row per event id, written inside the
// handler's transaction. Plain SQL: the table belongs to no company and has no model.
import { QueryTypes, UniqueConstraintError } from 'sequelize';
import type { Sequelize, Transaction } from 'sequelize';
import type Stripe from 'stripe';

const uuidPattern = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** The company the event's object names in its metadata, when it names one that looks like ours. */
export function companyIdOf(event: Stripe.Event): string | null {
  const object = event.data.object as { metadata?: unknown };
  const metadata = object.metadata;
  if (typeof metadata !== 'object' || metadata === null) return null;
  const companyId = (metadata as Record<string, unknown>).companyId;
  return typeof companyId === 'string' && uuidPattern.test(companyId) ? companyId : null;
}

function objectIdOf(event: Stripe.Event): string | null {
  const id = (event.data.object as { id?: unknown }).id;
  return typeof id === 'string' ? id.slice(0, 255) : null;
}

/**
 * Records the event; false when its id is recorded already. A concurrent delivery of the same
 * id waits here on the key until the first transaction ends, then finds it taken.
 */
export async function insertProcessorEvent(
  sequelize: Sequelize,
  transaction: Transaction,
  event: Stripe.Event,
  handled: boolean,
): Promise<boolean> {
  try {
    await sequelize.query(
      `INSERT INTO processor_events
         (event_id, type, object_id, company_id, handled, event_created_at, received_at)
       VALUES (?, ?, ?, ?, ?, ?, ?)`,
      {
        replacements: [
          event.id,
          event.type,
          objectIdOf(event),
          companyIdOf(event),
          handled,
          new Date((Number.isFinite(event.created) ? event.created : 0) * 1000),
          new Date(),
        ],
        type: QueryTypes.INSERT,
        transaction,
      },
    );
    return true;
  } catch (error) {
    if (error instanceof UniqueConstraintError) return false;
    throw error;
  }
}
