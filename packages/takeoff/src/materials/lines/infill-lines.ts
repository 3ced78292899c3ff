import type { InfillRecipe, TakeoffSettings } from '../../settings/takeoff-settings-schema.js';
import { bagsFor, roundTo } from '../formulas.js';
import { n } from '../rule-text.js';
import type { NormalisedTakeoffInput } from '../takeoff-input.js';
import type { TakeoffLine } from '../takeoff-line.js';
import { makeLine } from './make-line.js';

/** A warning when the total infill rate falls outside the usage's typical range, else none. */
export function infillRangeWarnings(usage: string, recipe: InfillRecipe): string[] {
  const total = recipe.layers.reduce((sum, layer) => sum + layer.rateLbPerSqFt, 0);
  const { typicalMinLbPerSqFt: min, typicalMaxLbPerSqFt: max } = recipe;
  const range = `${n(min)}–${n(max)} lb per sq ft`;
  if (total < min - 1e-9)
    return [`Infill at ${n(total)} lb per sq ft is below the usual ${range} for ${usage} turf.`];
  if (total > max + 1e-9)
    return [`Infill at ${n(total)} lb per sq ft is above the usual ${range} for ${usage} turf.`];
  return [];
}

/** Infill per layer (rate × area → lb → whole bags) and a total line that checks the range. */
export function infillLines(
  input: NormalisedTakeoffInput,
  settings: TakeoffSettings,
): TakeoffLine[] {
  const recipe = settings.infill[input.usage];
  if (recipe.layers.length === 0 || input.areaSqFt <= 0) return [];
  const area = input.areaSqFt;
  const layerLines = recipe.layers.map((layer) => {
    const pounds = layer.rateLbPerSqFt * area;
    const bags = bagsFor(pounds, layer.bagLb);
    return makeLine({
      key: `infill:${layer.key}`,
      kind: 'material',
      label: `Infill: ${layer.label}`,
      quantity: bags,
      unit: 'bags',
      rawQuantity: pounds / layer.bagLb,
      rule: `${n(area)} sq ft × ${n(layer.rateLbPerSqFt)} lb per sq ft = ${n(pounds)} lb ÷ ${n(layer.bagLb)} lb per bag = ${n(pounds / layer.bagLb)} bags`,
      rounding: `rounded up to whole ${n(layer.bagLb)} lb bags`,
      inputs: {
        areaSqFt: area,
        rateLbPerSqFt: layer.rateLbPerSqFt,
        bagLb: layer.bagLb,
        pounds: roundTo(pounds, 4),
        kind: layer.kind,
      },
    });
  });
  const totalRate = recipe.layers.reduce((sum, layer) => sum + layer.rateLbPerSqFt, 0);
  const totalPounds = totalRate * area;
  const total = makeLine({
    key: 'infill-total',
    kind: 'note',
    label: 'Infill, all layers',
    quantity: roundTo(totalPounds, 2),
    unit: 'lb',
    rawQuantity: totalPounds,
    rule: `${recipe.layers.map((l) => `${n(l.rateLbPerSqFt)}`).join(' + ')} lb per sq ft = ${n(totalRate)} lb per sq ft × ${n(area)} sq ft = ${n(totalPounds)} lb (usual for ${input.usage}: ${n(recipe.typicalMinLbPerSqFt)}–${n(recipe.typicalMaxLbPerSqFt)} lb per sq ft)`,
    rounding: 'to 0.01 lb',
    inputs: {
      totalRateLbPerSqFt: totalRate,
      typicalMinLbPerSqFt: recipe.typicalMinLbPerSqFt,
      typicalMaxLbPerSqFt: recipe.typicalMaxLbPerSqFt,
    },
    warnings: infillRangeWarnings(input.usage, recipe),
  });
  return [...layerLines, total];
}
