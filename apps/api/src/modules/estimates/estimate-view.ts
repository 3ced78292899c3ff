import { ESTIMATE_ROUNDING_RULE } from '@seamwright/domain';
import type { EstimateTier } from '@seamwright/domain';
import type { EstimateView } from '@seamwright/shared';
import type { EstimateRecord } from './estimates.repository.js';

/** The tier the top-level lines and totals show: the chosen one, else the first. */
export function mainTier(record: Pick<EstimateRecord, 'tiers' | 'chosenTierId'>): EstimateTier {
  const tier = record.tiers.find((t) => t.id === record.chosenTierId) ?? record.tiers[0];
  // Every write keeps at least one tier (estimate-edit.ts refuses removing the last).
  if (!tier) throw new Error('An estimate without tiers');
  return tier;
}

export function toEstimateView(record: EstimateRecord): EstimateView {
  const tier = mainTier(record);
  return {
    id: record.id,
    jobId: record.jobId,
    version: record.version,
    status: record.status,
    lines: tier.lines,
    subtotalCents: tier.subtotalCents,
    taxCents: tier.taxCents,
    totalCents: tier.totalCents,
    depositCents: tier.depositCents,
    tiers: record.tiers,
    chosenTierId: record.chosenTierId,
    warnings: record.warnings,
    notes: record.notes,
    validUntil: record.validUntil,
    depositRule: record.depositRule,
    markupBasisPoints: record.markupBasisPoints,
    taxRateBasisPoints: record.taxRateBasisPoints,
    roundingRule: ESTIMATE_ROUNDING_RULE.sentence,
    sentAt: record.sentAt ? record.sentAt.toISOString() : null,
    createdBy: record.createdBy,
    createdAt: record.createdAt.toISOString(),
    updatedAt: record.updatedAt.toISOString(),
  };
}
