// A job's reservation rows as the API shows them.
import type {
  JobReservationView,
  ReservationProductView,
  ReservationStatus,
} from '@seamwright/shared';
import type { AllocationRow, ReservationRow } from './reservations.repository.js';

export function toReservationView(
  jobId: string,
  reservations: ReservationRow[],
  allocations: AllocationRow[],
): JobReservationView {
  const products: ReservationProductView[] = reservations.map((reservation) => ({
    turfProductId: reservation.turfProductId,
    turfProductName: reservation.turfProductName,
    dyeLot: reservation.dyeLot,
    allocations: allocations
      .filter((allocation) => allocation.reservationId === reservation.id)
      .map((allocation) => ({
        rollId: allocation.rollId,
        dyeLot: reservation.dyeLot ?? '',
        isRemnant: allocation.isRemnant,
        areaId: allocation.areaId,
        areaName: allocation.areaName,
        piece: allocation.piece,
        widthFt: allocation.widthFt,
        lengthFt: allocation.lengthFt,
      })),
    shortFt: reservation.shortFt,
    toOrder: reservation.toOrder as ReservationProductView['toOrder'],
    isExhaustive: reservation.isExhaustive,
  }));
  const first = reservations[0];
  return {
    jobId,
    status: first ? (first.status as ReservationStatus) : null,
    dyeLot: products[0]?.dyeLot ?? null,
    allocations: products.flatMap((product) => product.allocations),
    shortFt: Math.round(products.reduce((sum, p) => sum + p.shortFt, 0) * 1000) / 1000,
    products,
    reservedAt: first ? first.createdAt.toISOString() : null,
  };
}
