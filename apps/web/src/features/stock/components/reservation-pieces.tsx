import type { JobReservationView, RollView } from '@seamwright/shared';
import { useUnits } from '../../../lib/units';
import type { UsedRoll } from '../utils/reservation-rolls';

interface ReservationPiecesProps {
  reservation: JobReservationView;
  rolls: UsedRoll[];
  /** The lot's rolls as stock lists them, by id, for widths and places (may still be loading). */
  stock: Map<string, RollView>;
}

/** Per product: the lot, each piece and the roll it comes from, and what must be ordered. */
export function ReservationPieces({ reservation, rolls, stock }: ReservationPiecesProps) {
  const units = useUnits();
  const numberOf = (rollId: string) => rolls.find((r) => r.rollId === rollId)?.number ?? 0;
  const size = (w: number, l: number) => `${units.length(w)} × ${units.length(l)}`;
  const verb = reservation.status === 'cut' ? 'Cut from' : 'Held from';
  return (
    <div className="flex flex-col gap-6">
      {reservation.products.map((product) => (
        <div key={product.turfProductId} className="flex flex-col gap-3">
          <h3 className="text-lg font-semibold">
            {product.turfProductName}:{' '}
            {product.dyeLot ? `${verb.toLowerCase()} dye lot ${product.dyeLot}` : 'none in stock'}
          </h3>
          {product.allocations.length > 0 ? (
            <div className="overflow-x-auto rounded-lg border border-line bg-white">
              <table className="w-full border-collapse text-left">
                <caption className="sr-only">Pieces of {product.turfProductName}</caption>
                <thead className="bg-sand-100">
                  <tr>
                    <th scope="col" className="px-3 py-2 font-semibold">
                      Area
                    </th>
                    <th scope="col" className="px-3 py-2 text-right font-semibold">
                      Piece
                    </th>
                    <th scope="col" className="px-3 py-2 text-right font-semibold">
                      Width × length
                    </th>
                    <th scope="col" className="px-3 py-2 font-semibold">
                      From
                    </th>
                  </tr>
                </thead>
                <tbody>
                  {product.allocations.map((a) => (
                    <tr key={`${a.areaId}-${a.piece}`} className="border-t border-line">
                      <td className="px-3 py-2">{a.areaName}</td>
                      <td className="px-3 py-2 text-right tabular-nums">{a.piece + 1}</td>
                      <td className="px-3 py-2 text-right whitespace-nowrap tabular-nums">
                        {size(a.widthFt, a.lengthFt)}
                      </td>
                      <td className="px-3 py-2 whitespace-nowrap">
                        {a.isRemnant ? 'Remnant' : 'Roll'} {numberOf(a.rollId)}
                      </td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
          ) : null}
          {product.toOrder.length > 0 ? (
            <p className="rounded-md border-l-4 border-caution-500 bg-caution-50 px-3 py-2">
              <strong>To order: </strong>
              {product.toOrder
                .map((o) => `${units.length(o.lengthFt)} of ${units.length(o.widthFt)} wide`)
                .join(' and ')}
              {product.dyeLot ? `, in dye lot ${product.dyeLot} if the supplier has it` : ''}.
            </p>
          ) : null}
        </div>
      ))}
      {rolls.length > 0 ? (
        <div>
          <h3 className="font-semibold">Rolls used</h3>
          <ul className="mt-1 flex flex-col gap-1">
            {rolls.map((roll) => {
              const known = stock.get(roll.rollId);
              return (
                <li key={roll.rollId}>
                  <span className="font-semibold">
                    {roll.isRemnant ? 'Remnant' : 'Roll'} {roll.number}
                  </span>
                  {known
                    ? `: ${size(known.widthFt, known.remainingFt)} left, ${known.location ?? 'no location recorded'}`
                    : `: lot ${roll.dyeLot}`}
                </li>
              );
            })}
          </ul>
        </div>
      ) : null}
    </div>
  );
}
