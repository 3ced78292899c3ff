import type { JobReservationView } from '@seamwright/shared';

export interface UsedRoll {
  rollId: string;
  /** 1, 2, … in the order the job's pieces first use them: what the cut sheet calls the roll. */
  number: number;
  turfProductId: string;
  dyeLot: string;
  isRemnant: boolean;
}

/** The rolls a reservation takes its pieces from, numbered from 1. */
export function usedRolls(reservation: JobReservationView): UsedRoll[] {
  const rolls = new Map<string, UsedRoll>();
  for (const product of reservation.products)
    for (const allocation of product.allocations)
      if (!rolls.has(allocation.rollId))
        rolls.set(allocation.rollId, {
          rollId: allocation.rollId,
          number: rolls.size + 1,
          turfProductId: product.turfProductId,
          dyeLot: allocation.dyeLot,
          isRemnant: allocation.isRemnant,
        });
  return [...rolls.values()];
}

/** The distinct product lots of a reservation, to read their rolls' widths and places. */
export function reservationLots(reservation: JobReservationView) {
  return reservation.products.flatMap((product) =>
    product.dyeLot === null || product.allocations.length === 0
      ? []
      : [{ turfProductId: product.turfProductId, dyeLot: product.dyeLot }],
  );
}
