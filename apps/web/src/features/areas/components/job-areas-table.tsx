import { Link } from 'react-router-dom';
import { areaUsageLabels } from '@seamwright/shared';
import { formatNumber } from '@seamwright/takeoff';
import { paths } from '../../../config/paths';
import { useUnits } from '../../../lib/units';
import type { Area } from '../api/area-types';

const th = 'py-2 pr-3';

/** The job's areas: name (to its plan), use, area, turf ordered and waste. */
export function JobAreasTable({ areas }: { areas: readonly Area[] }) {
  const units = useUnits();
  const total = areas.reduce(
    (sum, area) => ({ area: sum.area + area.areaSqFt, ordered: sum.ordered + area.orderedSqFt }),
    { area: 0, ordered: 0 },
  );
  return (
    <div className="relative overflow-x-auto rounded-lg border border-line bg-white px-4">
      <table className="w-full border-collapse text-left">
        <caption className="sr-only">Areas of this job</caption>
        <thead>
          <tr className="border-b-2 border-line-strong text-sm text-ink-muted">
            <th scope="col" className={th}>
              Area
            </th>
            <th scope="col" className={`${th} hidden sm:table-cell`}>
              Used for
            </th>
            <th scope="col" className={`${th} text-right`}>
              Size
            </th>
            <th scope="col" className={`${th} text-right`}>
              Turf ordered
            </th>
            <th scope="col" className="py-2 text-right">
              Waste
            </th>
          </tr>
        </thead>
        <tbody>
          {areas.map((area) => (
            <tr key={area.id} className="border-b border-line">
              <th scope="row" className={`${th} font-semibold`}>
                <Link to={paths.area(area.id)}>{area.name}</Link>
                {/* On a phone the use goes under the name, so the numbers keep their room. */}
                <span className="block text-sm font-normal text-ink-muted sm:hidden">
                  {areaUsageLabels[area.usage]}
                </span>
              </th>
              <td className={`${th} hidden sm:table-cell`}>{areaUsageLabels[area.usage]}</td>
              <td className={`${th} text-right tabular-nums whitespace-nowrap`}>
                {units.area(area.areaSqFt)}
              </td>
              <td className={`${th} text-right tabular-nums whitespace-nowrap`}>
                {units.area(area.orderedSqFt)}
              </td>
              <td className="py-2 text-right tabular-nums whitespace-nowrap">
                {formatNumber(area.wastePct, 1)} %
              </td>
            </tr>
          ))}
        </tbody>
        {areas.length > 1 ? (
          <tfoot>
            <tr className="font-semibold">
              <th scope="row" className={th}>
                All areas
              </th>
              <td className={`${th} hidden sm:table-cell`} />
              <td className={`${th} text-right tabular-nums whitespace-nowrap`}>
                {units.area(total.area)}
              </td>
              <td className={`${th} text-right tabular-nums whitespace-nowrap`}>
                {units.area(total.ordered)}
              </td>
              <td />
            </tr>
          </tfoot>
        ) : null}
      </table>
    </div>
  );
}
