// Applies a PATCH's line and tier edits to an estimate's tiers. Edits refer to lines and tiers
// by id; an id that is not on the estimate is a 400 naming the field, and nothing is saved.
import { randomUUID } from 'node:crypto';
import { markedUpUnitPriceCents } from '@seamwright/domain';
import type {
  EstimateLineInput,
  EstimateTier,
  EstimateTierInput,
  PricingItem,
} from '@seamwright/domain';
import type { UpdateEstimateData } from '@seamwright/shared';
import { AppError } from '../../errors.js';
import { turfItemFor } from './estimate-build.js';

function invalid(path: string, message: string): AppError {
  return new AppError('VALIDATION_FAILED', `${path}: ${message}`, { errors: [{ path, message }] });
}

/** Tiers without their totals, lines without amounts: what the domain computes from. */
export function toTierInputs(tiers: readonly EstimateTier[]): EstimateTierInput[] {
  return tiers.map((tier) => ({
    id: tier.id,
    name: tier.name,
    turfProductId: tier.turfProductId,
    lines: tier.lines.map(({ amountCents: _amount, ...line }) => line),
  }));
}

/** A copy of a tier's lines with the turf priced again with one product (lines merged). */
function repricedTurf(
  lines: readonly EstimateLineInput[],
  product: PricingItem | undefined,
  markupBasisPoints: number,
): EstimateLineInput[] {
  const copies: EstimateLineInput[] = lines.map((line) => ({ ...line, id: randomUUID() }));
  if (!product) return copies;
  const turf = copies.filter((line) => line.kind === 'turf');
  if (turf.length === 0) return copies;
  const quantity = Math.round(turf.reduce((sum, l) => sum + l.quantity, 0) * 1e6) / 1e6;
  const unitPriceCents = markedUpUnitPriceCents(product.priceMillicents, markupBasisPoints);
  const merged: EstimateLineInput = {
    id: randomUUID(),
    key: `turf:${product.key}`,
    kind: 'turf',
    label: product.name,
    quantity,
    unit: turf[0]?.unit ?? 'sq ft',
    unitPriceCents,
    taxable: turf[0]?.taxable ?? true,
    source: 'takeoff',
    rule: `${quantity} sq ft ordered over all areas; priced as ${product.name} (${product.key})`,
    priceBookItemId: product.id,
  };
  const first = copies.indexOf(turf[0] as EstimateLineInput);
  const rest = copies.filter((line) => line.kind !== 'turf');
  rest.splice(first, 0, merged);
  return rest;
}

function applyTierEdits(
  tiers: EstimateTierInput[],
  edits: NonNullable<UpdateEstimateData['tiers']>,
  items: readonly PricingItem[],
  markupBasisPoints: number,
): EstimateTierInput[] {
  let out = tiers;
  edits.add?.forEach((add, i) => {
    const from = add.copyFromTierId ? out.find((t) => t.id === add.copyFromTierId) : out[0];
    if (!from) throw invalid(`tiers.add.${i}.copyFromTierId`, 'No such tier on this estimate');
    const product = add.turfProductId
      ? turfItemFor(items, add.turfProductId, `tiers.add.${i}.turfProductId`)
      : undefined;
    out = [
      ...out,
      {
        id: randomUUID(),
        name: add.name,
        turfProductId: product?.id ?? from.turfProductId,
        lines: repricedTurf(from.lines, product, markupBasisPoints),
      },
    ];
  });
  edits.rename?.forEach((rename, i) => {
    if (!out.some((t) => t.id === rename.id))
      throw invalid(`tiers.rename.${i}.id`, 'No such tier on this estimate');
    out = out.map((t) => (t.id === rename.id ? { ...t, name: rename.name } : t));
  });
  edits.remove?.forEach((id, i) => {
    if (!out.some((t) => t.id === id))
      throw invalid(`tiers.remove.${i}`, 'No such tier on this estimate');
    out = out.filter((t) => t.id !== id);
  });
  if (out.length === 0) throw invalid('tiers.remove', 'An estimate keeps at least one tier');
  return out;
}

function applyLineEdits(
  tiers: EstimateTierInput[],
  edits: NonNullable<UpdateEstimateData['lines']>,
): EstimateTierInput[] {
  const hasLine = (id: string) => tiers.some((t) => t.lines.some((l) => l.id === id));
  let out = tiers;
  edits.update?.forEach((change, i) => {
    if (!hasLine(change.id)) throw invalid(`lines.update.${i}.id`, 'No such line on this estimate');
    out = out.map((tier) => ({
      ...tier,
      lines: tier.lines.map((line): EstimateLineInput => {
        if (line.id !== change.id) return line;
        const { id: _id, ...fields } = change;
        const defined = Object.fromEntries(
          Object.entries(fields).filter(([, v]) => v !== undefined),
        );
        if (line.source === 'manual') return { ...line, ...defined };
        return {
          ...line,
          ...defined,
          source: 'manual-override',
          computed: line.computed ?? {
            quantity: line.quantity,
            unitPriceCents: line.unitPriceCents,
          },
        };
      }),
    }));
  });
  edits.add?.forEach((add, i) => {
    const tierId = add.tierId ?? out[0]?.id;
    if (!out.some((t) => t.id === tierId))
      throw invalid(`lines.add.${i}.tierId`, 'No such tier on this estimate');
    const line: EstimateLineInput = {
      id: randomUUID(),
      key: 'manual',
      kind: 'manual',
      label: add.label,
      quantity: add.quantity,
      unit: add.unit,
      unitPriceCents: add.unitPriceCents,
      taxable: add.taxable,
      source: 'manual',
      priceBookItemId: null,
    };
    out = out.map((t) => (t.id === tierId ? { ...t, lines: [...t.lines, line] } : t));
  });
  edits.remove?.forEach((id, i) => {
    if (!hasLine(id)) throw invalid(`lines.remove.${i}`, 'No such line on this estimate');
    out = out.map((t) => ({ ...t, lines: t.lines.filter((l) => l.id !== id) }));
  });
  return out;
}

/** Tier edits first (so a new tier copies the lines as they were), then line edits. */
export function applyEstimateEdits(
  tiers: readonly EstimateTier[],
  input: UpdateEstimateData,
  items: readonly PricingItem[],
  markupBasisPoints: number,
): EstimateTierInput[] {
  let out = toTierInputs(tiers);
  if (input.tiers) out = applyTierEdits(out, input.tiers, items, markupBasisPoints);
  if (input.lines) out = applyLineEdits(out, input.lines);
  return out;
}
