// Prices a job's takeoff into estimate tiers: the takeoff over all areas (getJobTakeoff), the
// company's price book and its estimating settings, through @seamwright/domain's priceTakeoff.
import { randomUUID } from 'node:crypto';
import { priceTakeoff } from '@seamwright/domain';
import type { EstimateTierInput, PricingItem } from '@seamwright/domain';
import { standardEstimatingSettings } from '@seamwright/shared';
import type { DepositRule, PriceBookItemView } from '@seamwright/shared';
import type { RequestContext } from '../../context.js';
import { AppError } from '../../errors.js';
import { listAreasOfJob } from '../areas/areas.repository.js';
import { getJobTakeoff } from '../areas/job-takeoff.service.js';
import { findEstimatingSettings } from '../estimating-settings/estimating-settings.repository.js';
import { listAllPriceBookItems } from '../price-book/price-book.repository.js';

export interface EstimateRatesSnapshot {
  markupBasisPoints: number;
  taxRateBasisPoints: number;
  depositRule: DepositRule;
}

export interface BuiltEstimate {
  tiers: EstimateTierInput[];
  warnings: string[];
  rates: EstimateRatesSnapshot;
}

export interface TierSpec {
  name: string;
  turfProductId?: string | null | undefined;
}

export function toPricingItem(item: PriceBookItemView): PricingItem {
  const basis = item.kind === 'labour' ? item.attributes.basis : undefined;
  return {
    id: item.id,
    kind: item.kind,
    key: item.key,
    name: item.name,
    unit: item.unit,
    packSize: item.packSize,
    priceMillicents: item.priceMillicents,
    ...(basis ? { basis } : {}),
  };
}

/** The company's rates; the standard ones for a company made before the settings existed. */
export async function companyRates(ctx: RequestContext): Promise<EstimateRatesSnapshot> {
  const row = await findEstimatingSettings(ctx);
  const source = row ?? standardEstimatingSettings;
  return {
    markupBasisPoints: source.markupBasisPoints,
    taxRateBasisPoints: source.taxRateBasisPoints,
    depositRule: source.depositRule,
  };
}

/** A turf product named by the request: another company's or none is 404, not turf is 400. */
export function turfItemFor(items: readonly PricingItem[], id: string, path: string): PricingItem {
  const item = items.find((i) => i.id === id);
  if (!item)
    throw new AppError('NOT_FOUND', 'Turf product not found', {
      errors: [{ path, message: 'No such turf product in the price book' }],
    });
  if (item.kind !== 'turf') {
    const message = `${item.name} is not a turf product`;
    throw new AppError('VALIDATION_FAILED', `${path}: ${message}`, {
      errors: [{ path, message }],
    });
  }
  return item;
}

/**
 * Every tier priced from the job's current takeoff. A job without areas has nothing to price:
 * 409 saying so. 404 for another company's job.
 */
export async function buildEstimate(
  ctx: RequestContext,
  jobId: string,
  specs: readonly TierSpec[] | undefined,
): Promise<BuiltEstimate> {
  const [takeoff, areas, book, rates] = await Promise.all([
    getJobTakeoff(ctx, jobId),
    listAreasOfJob(ctx, jobId),
    listAllPriceBookItems(ctx),
    companyRates(ctx),
  ]);
  const items = book.map(toPricingItem);
  const wanted: TierSpec[] = specs && specs.length > 0 ? [...specs] : [{ name: 'Standard' }];
  // The request's own fields first: a product that is not there is a 404 naming it.
  wanted.forEach((spec, index) => {
    if (spec.turfProductId) turfItemFor(items, spec.turfProductId, `tiers.${index}.turfProductId`);
  });
  if (areas.length === 0) {
    const message = 'The job has no areas yet: draw at least one area before making an estimate';
    throw new AppError('CONFLICT', message, { errors: [{ path: 'areas', message }] });
  }
  const measures = {
    areaSqFt: Math.round(areas.reduce((sum, a) => sum + a.areaSqFt, 0) * 100) / 100,
    seamFt:
      Math.round(
        areas.reduce((sum, a) => sum + a.plan.seams.sideFt + a.plan.seams.buttFt, 0) * 100,
      ) / 100,
  };
  const warnings = new Set<string>();
  const tiers = wanted.map((spec): EstimateTierInput => {
    const productId = spec.turfProductId ?? undefined;
    const priced = priceTakeoff(
      {
        lines: takeoff.lines,
        items,
        markupBasisPoints: rates.markupBasisPoints,
        measures,
        ...(productId === undefined ? {} : { turfProductId: productId }),
      },
      randomUUID,
    );
    for (const warning of priced.warnings) warnings.add(warning);
    return {
      id: randomUUID(),
      name: spec.name,
      turfProductId: productId ?? null,
      lines: priced.lines,
    };
  });
  return { tiers, warnings: [...warnings], rates };
}
