// Puts the demo roll stock in place once (when the demo company has no rolls), through the
// same services a request uses, and holds the sold demo jobs' turf on it.
import type { RequestContext } from '../context.js';
import type { ServiceDeps } from '../deps.js';
import { JobModel, RollModel } from '../db/models/index.js';
import { scoped } from '../db/tenant-scope.js';
import { inTransaction } from '../db/sequelize.js';
import { findPriceBookItemByKey } from '../modules/price-book/price-book.repository.js';
import { createReservationsService } from '../modules/stock/reservations.service.js';
import { createRollsService } from '../modules/stock/rolls.service.js';
import { demoDeliveries, demoRemnants, demoReservedJobTitles } from './demo-stock.js';

async function turfId(
  ctx: RequestContext,
  deps: Pick<ServiceDeps, 'sequelize'>,
  key: string,
): Promise<string> {
  const item = await inTransaction(deps.sequelize, (tx) => findPriceBookItemByKey(ctx, key, tx));
  if (!item) throw new Error(`The demo price book has no ${key}.`);
  return item.id;
}

export async function seedDemoStock(
  ctx: RequestContext,
  deps: Pick<ServiceDeps, 'sequelize' | 'plannerPool'>,
): Promise<void> {
  if ((await scoped(ctx, RollModel).count()) > 0) return;
  const rolls = createRollsService(deps);
  for (const delivery of demoDeliveries)
    await rolls.receiveDelivery(ctx, {
      turfProductId: await turfId(ctx, deps, delivery.turfKey),
      dyeLot: delivery.dyeLot,
      location: delivery.location,
      receivedOn: delivery.receivedOn,
      rolls: delivery.rolls,
    });
  for (const remnant of demoRemnants)
    await rolls.create(ctx, {
      turfProductId: await turfId(ctx, deps, remnant.turfKey),
      dyeLot: remnant.dyeLot,
      widthFt: remnant.widthFt,
      lengthFt: remnant.lengthFt,
      location: remnant.location,
      isRemnant: true,
      receivedOn: null,
      notes: 'Left from an earlier job',
    });
  const reservations = createReservationsService(deps);
  for (const title of demoReservedJobTitles) {
    const [job] = await scoped(ctx, JobModel).findAll({ where: { title } });
    // Hold what there is even where the demo stock runs short, so the panel shows an order.
    if (job) await reservations.reserve(ctx, job.id, { allowShort: true });
  }
}
