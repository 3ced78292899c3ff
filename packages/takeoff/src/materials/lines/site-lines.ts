import type { TakeoffSettings } from '../../settings/takeoff-settings-schema.js';
import { cubicYardsOfLayer } from '../../units/conversions.js';
import {
  loadsNeeded,
  looseFromBank,
  roundTo,
  roundUpTo,
  tonsFromCubicYards,
  tonsFromPoundsPerCubicYard,
} from '../formulas.js';
import { n, plural } from '../rule-text.js';
import type { NormalisedTakeoffInput } from '../takeoff-input.js';
import type { TakeoffLine } from '../takeoff-line.js';
import { makeLine } from './make-line.js';

/** Excavation spoil (loose cu yd) and the loads to haul it, limited by volume or by weight. */
export function excavationLines(
  input: NormalisedTakeoffInput,
  settings: TakeoffSettings,
): TakeoffLine[] {
  const digDepthIn = input.digDepthIn ?? settings.excavation.digDepthIn;
  if (digDepthIn <= 0 || input.areaSqFt <= 0) return [];
  const { soilSwellPercent, spoilLooseDensityLbPerCuYd } = settings.excavation;
  const bank = cubicYardsOfLayer(input.areaSqFt, digDepthIn);
  const loose = looseFromBank(bank, soilSwellPercent);
  const spoil = makeLine({
    key: 'excavation-spoil',
    kind: 'haul',
    label: 'Excavation spoil (loose)',
    quantity: roundTo(loose, 2),
    unit: 'cu yd',
    rawQuantity: loose,
    rule: `${n(input.areaSqFt)} sq ft × ${n(digDepthIn)} in ÷ 324 = ${n(bank)} cu yd in place × (1 + ${n(soilSwellPercent)} % swell) = ${n(loose)} cu yd loose`,
    rounding: 'to 0.01 cu yd',
    inputs: { areaSqFt: input.areaSqFt, digDepthIn, bankCuYd: roundTo(bank, 4), soilSwellPercent },
  });
  const tons = tonsFromPoundsPerCubicYard(loose, spoilLooseDensityLbPerCuYd);
  const { capacityCuYd, capacityTons, label: boxLabel } = settings.haul;
  const loads = loadsNeeded(loose, tons, capacityCuYd, capacityTons);
  const haul = makeLine({
    key: 'haul-loads',
    kind: 'haul',
    label: `Haul-off (${boxLabel})`,
    quantity: loads.loads,
    unit: 'loads',
    rawQuantity: Math.max(loose / capacityCuYd, tons / capacityTons),
    rule:
      `${n(loose)} cu yd loose × ${n(spoilLooseDensityLbPerCuYd)} lb per cu yd = ${n(loose * spoilLooseDensityLbPerCuYd, 0)} lb = ${n(tons)} tons; ` +
      `by volume ${n(loose)} ÷ ${n(capacityCuYd)} cu yd = ${plural(loads.byVolume, 'load', 'loads')}, by weight ${n(tons)} ÷ ${n(capacityTons)} tons = ${plural(loads.byWeight, 'load', 'loads')}; the larger governs`,
    rounding: 'rounded up to whole loads',
    inputs: {
      looseCuYd: roundTo(loose, 4),
      spoilLooseDensityLbPerCuYd,
      spoilTons: roundTo(tons, 4),
      capacityCuYd,
      capacityTons,
    },
    warnings: loads.isWeightLimited
      ? [
          `Weight, not volume, limits these loads: ${n(tons, 1)} tons of spoil against ${n(capacityTons)} tons per ${boxLabel}.`,
        ]
      : [],
  });
  return [spoil, haul];
}

/** Base stone: compacted cu yd → loose cu yd to order → tons to order, plus the compaction note. */
export function baseLines(input: NormalisedTakeoffInput, settings: TakeoffSettings): TakeoffLine[] {
  const depthIn = input.baseDepthIn ?? settings.base.depthIn;
  if (depthIn <= 0 || input.areaSqFt <= 0) return [];
  const {
    looseToCompactedFactor: factor,
    densityTonsPerCuYd,
    orderIncrementCuYd,
    orderIncrementTons,
  } = settings.base;
  const compacted = cubicYardsOfLayer(input.areaSqFt, depthIn);
  const loose = compacted * factor;
  const tons = tonsFromCubicYards(loose, densityTonsPerCuYd);
  const volumeRule = `${n(input.areaSqFt)} sq ft × ${n(depthIn)} in ÷ 324 = ${n(compacted)} cu yd compacted × ${n(factor, 3)} loose factor = ${n(loose)} cu yd loose`;
  // Trade sanity check: about 1 cu yd per 100 sq ft at 3 in, scaled to this depth.
  const thumb = (input.areaSqFt / 100) * (depthIn / 3);
  const volume = makeLine({
    key: 'base-stone-volume',
    kind: 'material',
    label: 'Base stone (loose volume)',
    quantity: roundUpTo(loose, orderIncrementCuYd),
    unit: 'cu yd',
    rawQuantity: loose,
    rule: `${volumeRule} (check: about 1 cu yd per 100 sq ft at 3 in ≈ ${n(thumb)} cu yd)`,
    rounding: `rounded up to ${n(orderIncrementCuYd)} cu yd`,
    inputs: {
      areaSqFt: input.areaSqFt,
      baseDepthIn: depthIn,
      compactedCuYd: roundTo(compacted, 4),
      looseToCompactedFactor: factor,
    },
  });
  const weight = makeLine({
    key: 'base-stone-tons',
    kind: 'material',
    label: 'Base stone (weight)',
    quantity: roundUpTo(tons, orderIncrementTons),
    unit: 'tons',
    rawQuantity: tons,
    rule: `${volumeRule} × ${n(densityTonsPerCuYd)} tons per cu yd = ${n(tons)} tons`,
    rounding: `rounded up to ${n(orderIncrementTons)} ton`,
    inputs: { looseCuYd: roundTo(loose, 4), densityTonsPerCuYd },
  });
  const { targetPercent, testName } = settings.compaction;
  const compaction = makeLine({
    key: 'compaction',
    kind: 'note',
    label: 'Base compaction target',
    quantity: targetPercent,
    unit: '%',
    rawQuantity: targetPercent,
    rule: `Compact the ${n(depthIn)} in base to at least ${n(targetPercent)} % of maximum dry density by the ${testName} test; wet the base before compacting`,
    rounding: 'none',
    inputs: { targetPercent, testName },
  });
  return [volume, weight, compaction];
}

/**
 * Where to set the base next to a hard surface so the turf top finishes a little above it:
 * base grade below the hard surface = pile height − finish height above it.
 */
export function finishHeightLines(
  input: NormalisedTakeoffInput,
  settings: TakeoffSettings,
): TakeoffLine[] {
  const pile = input.turf.pileHeightIn;
  if (pile === undefined) return [];
  const above = settings.finishHeight.aboveHardSurfaceIn;
  const recess = pile - above;
  const isBelow = recess >= 0;
  return [
    makeLine({
      key: 'finish-height',
      kind: 'guidance',
      label: isBelow
        ? 'Base grade below adjacent hard surfaces'
        : 'Base grade above adjacent hard surfaces',
      quantity: roundTo(Math.abs(recess), 3),
      unit: 'in',
      rawQuantity: Math.abs(recess),
      rule: `turf top ${n(above, 3)} in above the hard surface: ${n(pile, 3)} in pile − ${n(above, 3)} in = base ${n(Math.abs(recess), 3)} in ${isBelow ? 'below' : 'above'} the hard surface`,
      rounding: 'to 0.001 in',
      inputs: { pileHeightIn: pile, aboveHardSurfaceIn: above },
    }),
  ];
}
