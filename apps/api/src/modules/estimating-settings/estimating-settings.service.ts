import type { Sequelize } from 'sequelize';
import {
  standardEstimatingSettings,
  type EstimatingSettingsView,
  type UpdateEstimatingSettingsData,
} from '@seamwright/shared';
import { defaultTakeoffSettings } from '@seamwright/takeoff';
import type { RequestContext } from '../../context.js';
import { inTransaction } from '../../db/sequelize.js';
import { AppError } from '../../errors.js';
import { describeFieldErrors } from '../../http/validate.js';
import { recordAuditEvent } from '../audit/audit.repository.js';
import type { EstimatingSettingsRecord } from './estimating-settings.repository.js';
import {
  createEstimatingSettingsRow,
  findEstimatingSettings,
  updateEstimatingSettingsRow,
} from './estimating-settings.repository.js';
import {
  effectiveTakeoffSettings,
  mergeOverrides,
  pruneOverrides,
  takeoffSettingViews,
} from './takeoff-overrides.js';

const standardRecord = (): EstimatingSettingsRecord => ({
  ...standardEstimatingSettings,
  takeoffOverrides: {},
});

function toView(record: EstimatingSettingsRecord): EstimatingSettingsView {
  const effective = effectiveTakeoffSettings(record.takeoffOverrides);
  // Stored overrides passed the same check when they were saved; fall back to the standard
  // should a later, stricter schema refuse an old value.
  const settings = effective.settings ?? defaultTakeoffSettings;
  return {
    takeoff: settings,
    takeoffOverrides: effective.settings ? record.takeoffOverrides : {},
    takeoffFields: takeoffSettingViews(settings, effective.settings ? record.takeoffOverrides : {}),
    markupBasisPoints: record.markupBasisPoints,
    taxRateBasisPoints: record.taxRateBasisPoints,
    depositRule: record.depositRule,
    standard: standardEstimatingSettings,
  };
}

export function createEstimatingSettingsService(sequelize: Sequelize) {
  async function get(ctx: RequestContext): Promise<EstimatingSettingsView> {
    return toView((await findEstimatingSettings(ctx)) ?? standardRecord());
  }

  async function update(
    ctx: RequestContext,
    input: UpdateEstimatingSettingsData,
  ): Promise<EstimatingSettingsView> {
    const saved = await inTransaction(sequelize, async (tx) => {
      const row = await findEstimatingSettings(ctx, tx);
      const current = row ?? standardRecord();
      const merged = input.takeoff
        ? mergeOverrides(current.takeoffOverrides, input.takeoff)
        : current.takeoffOverrides;
      const effective = effectiveTakeoffSettings(merged);
      if (!effective.settings)
        throw new AppError('VALIDATION_FAILED', describeFieldErrors(effective.errors), {
          errors: effective.errors,
        });
      const next: EstimatingSettingsRecord = {
        takeoffOverrides: pruneOverrides(merged, defaultTakeoffSettings),
        markupBasisPoints: input.markupBasisPoints ?? current.markupBasisPoints,
        taxRateBasisPoints: input.taxRateBasisPoints ?? current.taxRateBasisPoints,
        depositRule: input.depositRule ?? current.depositRule,
      };
      if (row) await updateEstimatingSettingsRow(ctx, row.id, next, tx);
      else await createEstimatingSettingsRow(ctx, next, tx);
      await recordAuditEvent(
        ctx,
        {
          action: 'estimating_settings.updated',
          entity: 'estimating_settings',
          entityId: null,
          data: { fields: Object.keys(input) },
        },
        tx,
      );
      return next;
    });
    return toView(saved);
  }

  return { get, update };
}
