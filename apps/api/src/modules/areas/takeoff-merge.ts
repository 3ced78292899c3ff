// Adds up the takeoff lines of several areas into the job's lines. Each area's line is already
// rounded the way its rule says (whole bags, loads rounded up, …); the job line is the sum of
// those rounded quantities, so every area can be bought and delivered for on its own. Notes and
// guidance (compaction target, base grade, roll weight) are not amounts: the job line shows
// the largest.
import type { CautionView, JobTakeoffLineView, TakeoffLineAreaShare } from '@seamwright/shared';
import type { Caution, TakeoffLine } from '@seamwright/takeoff';

export interface AreaLines {
  areaId: string;
  areaName: string;
  turfProductId: string | null;
  lines: readonly TakeoffLine[];
}

/** Sums without float noise: 2.35 + 1.1 is 3.45, not 3.4499999999999997. */
function add(values: readonly number[]): number {
  return Math.round(values.reduce((sum, v) => sum + v, 0) * 1e6) / 1e6;
}

function isAmount(line: TakeoffLine): boolean {
  return line.kind !== 'note' && line.kind !== 'guidance';
}

function merged(entries: { area: AreaLines; line: TakeoffLine }[]): JobTakeoffLineView {
  const first = entries[0] as { area: AreaLines; line: TakeoffLine };
  const shares: TakeoffLineAreaShare[] = entries.map(({ area, line }) => ({
    areaId: area.areaId,
    areaName: area.areaName,
    turfProductId: area.turfProductId,
    quantity: line.quantity,
    rawQuantity: line.rawQuantity,
    rule: line.rule,
  }));
  const base = { key: first.line.key, kind: first.line.kind, label: first.line.label };
  if (entries.length === 1)
    return {
      ...base,
      quantity: first.line.quantity,
      unit: first.line.unit,
      rawQuantity: first.line.rawQuantity,
      rule: first.line.rule,
      rounding: first.line.rounding,
      inputs: first.line.inputs,
      warnings: first.line.warnings,
      areas: shares,
    };
  const warnings = [...new Set(entries.flatMap(({ line }) => line.warnings))];
  if (!isAmount(first.line)) {
    const top = entries.reduce((best, next) =>
      next.line.quantity > best.line.quantity ? next : best,
    );
    return {
      ...base,
      quantity: top.line.quantity,
      unit: top.line.unit,
      rawQuantity: top.line.rawQuantity,
      rule: `largest of ${entries.length} areas (${top.area.areaName}): ${top.line.rule}`,
      rounding: top.line.rounding,
      inputs: top.line.inputs,
      warnings,
      areas: shares,
    };
  }
  const quantity = add(entries.map(({ line }) => line.quantity));
  return {
    ...base,
    quantity,
    unit: first.line.unit,
    rawQuantity: add(entries.map(({ line }) => line.rawQuantity)),
    rule: `sum of ${entries.length} areas: ${entries
      .map(({ area, line }) => `${area.areaName} ${line.quantity} ${line.unit}`)
      .join(' + ')} = ${quantity} ${first.line.unit}`,
    rounding: `each area ${first.line.rounding}, then added`,
    inputs: Object.fromEntries(entries.map(({ area, line }) => [area.areaName, line.quantity])),
    warnings,
    areas: shares,
  };
}

/** The job's lines, in the order the takeoff lists them, each with every area's share. */
export function mergeTakeoffLines(areas: readonly AreaLines[]): JobTakeoffLineView[] {
  const byKey = new Map<string, { area: AreaLines; line: TakeoffLine }[]>();
  for (const area of areas)
    for (const line of area.lines) {
      const list = byKey.get(line.key) ?? [];
      list.push({ area, line });
      byKey.set(line.key, list);
    }
  return [...byKey.values()].map(merged);
}

/** Every caution any area raises, once each, in the cautions' own order (most urgent first). */
export function mergeCautions(perArea: readonly (readonly Caution[])[]): CautionView[] {
  const order = [
    'utility-locate',
    'heavy-rolls',
    'silica-dust',
    'playground-fall-height',
    'pets-perimeter',
    'turf-heat',
  ];
  const byKey = new Map<string, Caution>();
  for (const list of perArea) for (const c of list) if (!byKey.has(c.key)) byKey.set(c.key, c);
  return [...byKey.values()]
    .sort((a, b) => order.indexOf(a.key) - order.indexOf(b.key))
    .map(({ key, title, body, deferral, reference }) => ({
      key,
      title,
      body,
      deferral,
      reference,
    }));
}
