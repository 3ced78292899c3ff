// Builds the reservation search's request from a job's saved-plan pieces and the locked rolls,
// and says in words why a job cannot be reserved.
import { MAX_RESERVATION_PIECES, MAX_RESERVATION_ROLLS } from '@seamwright/takeoff';
import type { ReservationPlan, ReservationRequest } from '@seamwright/takeoff';
import { AppError } from '../../errors.js';
import type { JobTurfPieces } from '../areas/job-takeoff.service.js';
import { formatFeet } from './feet-words.js';

/** The job's turf grouped by product, refused when there is nothing (or no product) to hold. */
export function productsToReserve(groups: JobTurfPieces[]) {
  const withPieces = groups.filter((group) => group.pieces.length > 0);
  if (withPieces.length === 0)
    throw conflict('areas', 'The job has no saved plans: draw its areas before reserving turf');
  const unnamed = withPieces.find((group) => group.turfProductId === null);
  if (unnamed) {
    const names = [...new Set(unnamed.pieces.map((piece) => piece.areaName))].join(', ');
    throw conflict('areas', `Choose a turf product for ${names} before reserving turf`);
  }
  for (const group of withPieces)
    if (group.pieces.length > MAX_RESERVATION_PIECES)
      throw conflict(
        'areas',
        `${group.turfProductName ?? 'A product'} has ${group.pieces.length} pieces; at most ${MAX_RESERVATION_PIECES} can be reserved at once`,
      );
  return withPieces as (JobTurfPieces & { turfProductId: string })[];
}

export interface LockedRoll {
  id: string;
  turfProductId: string;
  dyeLot: string;
  widthFt: number;
  remainingFt: number;
  heldFt: number;
  isRemnant: boolean;
  archivedAt: Date | null;
}

/**
 * The search request: each roll's free length is what is left minus what other jobs hold
 * (`heldByThisJob` is given back, since a new reservation replaces the job's old one).
 */
export function reservationRequest(
  products: (JobTurfPieces & { turfProductId: string })[],
  rolls: LockedRoll[],
  heldByThisJob: Map<string, number>,
): ReservationRequest {
  const productIds = new Set(products.map((product) => product.turfProductId));
  const usable = rolls.filter(
    (roll) => productIds.has(roll.turfProductId) && roll.archivedAt === null,
  );
  if (usable.length > MAX_RESERVATION_ROLLS)
    throw conflict(
      'rolls',
      `There are ${usable.length} rolls of these products; archive used-up ones (at most ${MAX_RESERVATION_ROLLS} are searched)`,
    );
  return {
    products: products.map((product) => ({
      productId: product.turfProductId,
      pieces: product.pieces.map(({ widthFt, lengthFt }) => ({ widthFt, lengthFt })),
    })),
    rolls: usable.map((roll) => ({
      id: roll.id,
      productId: roll.turfProductId,
      dyeLot: roll.dyeLot,
      widthFt: roll.widthFt,
      availableFt: Math.max(0, roll.remainingFt - roll.heldFt + (heldByThisJob.get(roll.id) ?? 0)),
      isRemnant: roll.isRemnant,
    })),
  };
}

/** 409 naming what to order when no single dye lot holds the job. */
export function shortConflict(
  plan: ReservationPlan,
  products: (JobTurfPieces & { turfProductId: string })[],
): AppError {
  const parts = plan.products
    .filter((product) => product.shortFt > 0)
    .map((product) => {
      const name =
        products.find((p) => p.turfProductId === product.productId)?.turfProductName ?? 'turf';
      const order = product.toOrder
        .map((o) => `${formatFeet(o.lengthFt)} of ${formatFeet(o.widthFt)} wide`)
        .join(' and ');
      return product.dyeLot === null
        ? `${name} has no rolls in stock: order ${order}`
        : `no single dye lot of ${name} holds the job (best: lot ${product.dyeLot}); order ${order}`;
    });
  const message = `Not enough turf in stock: ${parts.join('; ')}`;
  // Its own path, so a client can offer to hold what there is (`allowShort`) for this refusal only.
  return new AppError('CONFLICT', message, {
    errors: [{ path: 'stock', message }],
  });
}

export function conflict(path: string, message: string): AppError {
  return new AppError('CONFLICT', message, { errors: [{ path, message }] });
}
