// One verified event: its id recorded once and its handlers run, in one transaction.
import type Stripe from 'stripe';
import { DatabaseError } from 'sequelize';
import type { ServiceDeps } from '../../deps.js';
import { insertProcessorEvent } from './processor-events.repository.js';
import { processorEventHandlersFor } from './processor-events.registry.js';

export type EventOutcome = 'handled' | 'recorded' | 'duplicate';

/** InnoDB's answer when waiting duplicates all try again after the first rolled back. */
function isDeadlock(error: unknown): boolean {
  if (!(error instanceof DatabaseError)) return false;
  const original = error.original as { errno?: number } | undefined;
  return original?.errno === 1213;
}

export async function handleProcessorEvent(
  deps: ServiceDeps,
  event: Stripe.Event,
): Promise<EventOutcome> {
  const handlers = processorEventHandlersFor(event.type);
  for (let attempt = 1; ; attempt += 1) {
    try {
      return await deps.sequelize.transaction(async (transaction) => {
        const fresh = await insertProcessorEvent(
          deps.sequelize,
          transaction,
          event,
          handlers.length > 0,
        );
        if (!fresh) return 'duplicate';
        for (const handler of handlers) await handler(event, transaction, deps);
        return handlers.length > 0 ? 'handled' : 'recorded';
      });
    } catch (error) {
      if (attempt < 3 && isDeadlock(error)) continue;
      throw error;
    }
  }
}
