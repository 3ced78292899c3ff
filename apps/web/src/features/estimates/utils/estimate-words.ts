import type { EstimateLineSource, EstimateStatus } from '@seamwright/shared';
import { formatNumber, type TakeoffUnit } from '@seamwright/takeoff';
import type { Units } from '../../../lib/units';

export const estimateStatusLabels: Record<EstimateStatus, string> = {
  draft: 'Draft',
  sent: 'Sent',
  accepted: 'Accepted',
  declined: 'Declined',
  superseded: 'Replaced by a newer version',
};

export const lineSourceLabels: Record<EstimateLineSource, string> = {
  takeoff: 'From the takeoff',
  'manual-override': 'Changed by hand',
  manual: 'Typed by hand',
};

const takeoffUnits = new Set<string>([
  'sq ft',
  'sq yd',
  'cu yd',
  'tons',
  'lb',
  'bags',
  'ea',
  'lf',
  'rolls',
  'gal',
  'boards',
  'loads',
  'hours',
  'days',
  'in',
  '%',
] satisfies TakeoffUnit[]);

function isTakeoffUnit(unit: string): unit is TakeoffUnit {
  return takeoffUnits.has(unit);
}

/**
 * A line's quantity with its unit: takeoff units go through the company's units (m² for metric
 * companies), anything typed by hand (`job`, `visit`) is shown as typed.
 */
export function lineQuantityText(units: Units, quantity: number, unit: string): string {
  if (isTakeoffUnit(unit)) return units.quantity(quantity, unit);
  return `${formatNumber(quantity, 2)} ${unit}`;
}

/** `30 %` or `$500.00`, for the deposit rule as a sentence part. */
export function percentText(basisPoints: number): string {
  return `${formatNumber(basisPoints / 100, 2)} %`;
}
