import type { TakeoffSettings } from '../../settings/takeoff-settings-schema.js';
import { ceilWhole, roundTo, roundUpTo } from '../formulas.js';
import { n, plural } from '../rule-text.js';
import type { NormalisedTakeoffInput } from '../takeoff-input.js';
import type { TakeoffLine } from '../takeoff-line.js';
import { makeLine } from './make-line.js';

/** Threaded caps: ½ in and ¾ in per head removed, one larger cap per zone closed at the valve. */
export function sprinklerCapLines(
  input: NormalisedTakeoffInput,
  settings: TakeoffSettings,
): TakeoffLine[] {
  const { capsPerHead, capsPerClosedZone, closedZoneCapSizeIn } = settings.sprinklerCaps;
  const { halfInchHeads, threeQuarterInchHeads, zonesClosed } = input.sprinklers;
  const rows: [string, string, number, number][] = [
    ['sprinkler-caps-half-inch', '½ in', halfInchHeads, capsPerHead],
    ['sprinkler-caps-three-quarter-inch', '¾ in', threeQuarterInchHeads, capsPerHead],
    ['sprinkler-caps-zone', `${n(closedZoneCapSizeIn, 3)} in`, zonesClosed, capsPerClosedZone],
  ];
  return rows
    .filter(([, , count, per]) => count * per > 0)
    .map(([key, size, count, per], index) =>
      makeLine({
        key,
        kind: 'material',
        label: `Sprinkler caps, ${size}`,
        quantity: count * per,
        unit: 'ea',
        rawQuantity: count * per,
        rule:
          index < 2
            ? `${plural(count, 'head', 'heads')} removed × ${n(per)} cap each`
            : `${plural(count, 'zone', 'zones')} closed at the valve × ${n(per)} cap each`,
        rounding: 'none',
        inputs: { count, capsEach: per },
      }),
    );
}

/** Rodent wire over the area, with the overlap between strips, in whole rolls. */
export function rodentWireLines(
  input: NormalisedTakeoffInput,
  settings: TakeoffSettings,
): TakeoffLine[] {
  if (!input.rodentWire || input.areaSqFt <= 0) return [];
  const { rollLengthFt, overlapIn } = settings.rodentWire;
  const widthFt = input.stripWidthFt ?? settings.rodentWire.rollWidthFt;
  const coverFt = widthFt - overlapIn / 12;
  if (coverFt <= 0)
    throw new RangeError(
      `Rodent wire overlap (${overlapIn} in) must be narrower than the strip (${widthFt} ft)`,
    );
  const wireSqFt = (input.areaSqFt * widthFt) / coverFt;
  const rollSqFt = widthFt * rollLengthFt;
  return [
    makeLine({
      key: 'rodent-wire',
      kind: 'material',
      label: 'Rodent wire',
      quantity: ceilWhole(wireSqFt / rollSqFt),
      unit: 'rolls',
      rawQuantity: wireSqFt / rollSqFt,
      rule: `${n(input.areaSqFt)} sq ft × ${n(widthFt)} ft strip ÷ (${n(widthFt)} ft − ${n(overlapIn)} in overlap) = ${n(wireSqFt)} sq ft of wire ÷ ${n(rollSqFt)} sq ft per ${n(widthFt)} × ${n(rollLengthFt)} ft roll = ${n(wireSqFt / rollSqFt)} rolls`,
      rounding: 'rounded up to whole rolls',
      inputs: {
        areaSqFt: input.areaSqFt,
        stripWidthFt: widthFt,
        overlapIn,
        rollLengthFt,
        wireSqFt: roundTo(wireSqFt, 2),
      },
    }),
  ];
}

/** Crew hours from production rates, and rental days for the equipment the job needs. */
export function labourLines(
  input: NormalisedTakeoffInput,
  settings: TakeoffSettings,
  needs: ReadonlySet<string>,
): TakeoffLine[] {
  const { installSqFtPerCrewHour, seamFtPerHour, hourIncrement } = settings.labour;
  const lines: TakeoffLine[] = [];
  if (input.areaSqFt > 0) {
    const hours = input.areaSqFt / installSqFtPerCrewHour;
    lines.push(
      makeLine({
        key: 'labour-install',
        kind: 'labour',
        label: 'Install labour (crew-hours)',
        quantity: roundUpTo(hours, hourIncrement),
        unit: 'hours',
        rawQuantity: hours,
        rule: `${n(input.areaSqFt)} sq ft ÷ ${n(installSqFtPerCrewHour)} sq ft per crew-hour = ${n(hours)} crew-hours`,
        rounding: `rounded up to ${n(hourIncrement)} h`,
        inputs: { areaSqFt: input.areaSqFt, installSqFtPerCrewHour },
      }),
    );
  }
  const seamFt = input.seams.sideFt + input.seams.buttFt;
  if (seamFt > 0) {
    const hours = seamFt / seamFtPerHour;
    lines.push(
      makeLine({
        key: 'labour-seams',
        kind: 'labour',
        label: 'Seaming labour',
        quantity: roundUpTo(hours, hourIncrement),
        unit: 'hours',
        rawQuantity: hours,
        rule: `${n(seamFt)} lf of seam ÷ ${n(seamFtPerHour)} lf per hour = ${n(hours)} hours`,
        rounding: `rounded up to ${n(hourIncrement)} h`,
        inputs: { seamFt, seamFtPerHour },
      }),
    );
  }
  for (const machine of settings.equipment) {
    if (input.areaSqFt <= 0 || (machine.neededFor !== 'always' && !needs.has(machine.neededFor)))
      continue;
    const days = input.areaSqFt / machine.sqFtPerDay;
    lines.push(
      makeLine({
        key: `equipment:${machine.key}`,
        kind: 'equipment',
        label: `${machine.label} rental`,
        quantity: ceilWhole(days),
        unit: 'days',
        rawQuantity: days,
        rule: `${n(input.areaSqFt)} sq ft ÷ ${n(machine.sqFtPerDay)} sq ft per day = ${n(days)} days`,
        rounding: 'rounded up to whole rental days',
        inputs: { areaSqFt: input.areaSqFt, sqFtPerDay: machine.sqFtPerDay },
      }),
    );
  }
  return lines;
}
