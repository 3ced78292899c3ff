// Pipeline, win rate, and the jobs installed in the period (area, price, turf planned and
// used), one statement each. The rules are stated in `rules` and shown with the figures.
import type { PipelineRow } from '@seamwright/shared';
import type { Sequelize } from 'sequelize';
import type { RequestContext } from '../../context.js';
import { scopedSql } from '../../db/tenant-scope.js';
import type { DashboardRange } from './dashboard-range.js';

/** Jobs still in the pipeline: everything before paid, and never lost or cancelled ones. */
export const pipelineStatuses = [
  'lead',
  'estimated',
  'accepted',
  'scheduled',
  'in_progress',
  'installed',
  'invoiced',
] as const;

/** Days an estimate without its own validity date stays open (as the estimate PDF prints). */
export const estimateValidityDays = 30;

export const rules = {
  pipeline:
    'Jobs not yet paid, lost or cancelled, each valued at the total of its latest estimate version (whatever its status), as of today.',
  winRate:
    'Estimates sent in the period: accepted ÷ (accepted + declined + expired). Expired: still unanswered after its validity date (30 days after sending without one). Replaced versions and those still open are left out.',
  installed:
    'Jobs moved to installed in the period (from the job history) and not later cancelled; area from the saved plans; value the accepted estimate’s subtotal before tax.',
  material:
    'Of the jobs installed in the period whose turf was cut from stock: planned = the turf the saved plans order; actual = the pieces cut from rolls less the remnants returned from the job. Margin = planned − actual.',
} as const;

export async function pipelineByStatus(
  ctx: RequestContext,
  sequelize: Sequelize,
): Promise<PipelineRow[]> {
  // The latest version per job through the covering index (company_id, job_id, version,
  // total_cents) of migration 0020: one index dive per job.
  const rows = await scopedSql(ctx, sequelize).select<{
    status: string;
    jobs: number | string;
    valueCents: number | string | null;
  }>(
    `SELECT j.status, COUNT(*) AS jobs, SUM(COALESCE(
              (SELECT e.total_cents FROM estimates e
                WHERE e.company_id = j.company_id AND e.job_id = j.id
                ORDER BY e.version DESC LIMIT 1), 0)) AS valueCents
       FROM jobs j
      WHERE j.company_id = :companyId AND j.status IN (:statuses)
      GROUP BY j.status`,
    { statuses: [...pipelineStatuses] },
  );
  const byStatus = new Map(rows.map((r) => [r.status, r]));
  return pipelineStatuses.map((status) => {
    const row = byStatus.get(status);
    return { status, jobs: Number(row?.jobs ?? 0), valueCents: Number(row?.valueCents ?? 0) };
  });
}

export async function winRate(ctx: RequestContext, sequelize: Sequelize, range: DashboardRange) {
  const [row] = await scopedSql(ctx, sequelize).select<{
    accepted: number | string | null;
    declined: number | string | null;
    expired: number | string | null;
  }>(
    `SELECT SUM(status = 'accepted') AS accepted, SUM(status = 'declined') AS declined,
            SUM(status = 'sent' AND COALESCE(valid_until,
                DATE(sent_at) + INTERVAL :validityDays DAY) < :today) AS expired
       FROM estimates
      WHERE company_id = :companyId AND sent_at >= :fromInstant AND sent_at < :toInstant
        AND status IN ('accepted', 'declined', 'sent')`,
    {
      validityDays: estimateValidityDays,
      today: range.today,
      fromInstant: range.fromInstant,
      toInstant: range.toInstant,
    },
  );
  const accepted = Number(row?.accepted ?? 0);
  const declined = Number(row?.declined ?? 0);
  const expired = Number(row?.expired ?? 0);
  const answered = accepted + declined + expired;
  return {
    accepted,
    declined,
    expired,
    rate: answered === 0 ? null : accepted / answered,
    rule: rules.winRate,
  };
}

export interface InstalledFigures {
  jobs: number;
  sqFt: number;
  valueCents: number;
  /** Jobs whose price and area both count (the average's base). */
  pricedSqFt: number;
  pricedValueCents: number;
  materialJobs: number;
  plannedSqFt: number;
  cutSqFt: number;
  returnedSqFt: number;
}

/**
 * The jobs installed in the period, found through the job history's
 * `job.status_changed → installed` events (index `audit_events_company_action`, 0020), with
 * per-job figures read by key through each table's (company_id, job_id) index.
 */
export async function installedFigures(
  ctx: RequestContext,
  sequelize: Sequelize,
  range: DashboardRange,
): Promise<InstalledFigures> {
  const [row] = await scopedSql(ctx, sequelize).select<Record<keyof InstalledFigures, unknown>>(
    `SELECT COUNT(*) AS jobs, COALESCE(SUM(t.sqFt), 0) AS sqFt,
            COALESCE(SUM(t.valueCents), 0) AS valueCents,
            COALESCE(SUM(CASE WHEN t.valueCents IS NOT NULL AND t.sqFt > 0 THEN t.sqFt END), 0)
              AS pricedSqFt,
            COALESCE(SUM(CASE WHEN t.valueCents IS NOT NULL AND t.sqFt > 0 THEN t.valueCents END), 0)
              AS pricedValueCents,
            COALESCE(SUM(t.cutSqFt > 0), 0) AS materialJobs,
            COALESCE(SUM(CASE WHEN t.cutSqFt > 0 THEN t.plannedSqFt END), 0) AS plannedSqFt,
            COALESCE(SUM(t.cutSqFt), 0) AS cutSqFt,
            COALESCE(SUM(CASE WHEN t.cutSqFt > 0 THEN t.returnedSqFt END), 0) AS returnedSqFt
       FROM (
         SELECT j.id,
           (SELECT SUM(a.area_sq_ft) FROM job_areas a
             WHERE a.company_id = j.company_id AND a.job_id = j.id) AS sqFt,
           (SELECT SUM(a.ordered_sq_ft) FROM job_areas a
             WHERE a.company_id = j.company_id AND a.job_id = j.id) AS plannedSqFt,
           (SELECT e.subtotal_cents FROM estimates e
             WHERE e.company_id = j.company_id AND e.job_id = j.id AND e.status = 'accepted'
             ORDER BY e.version DESC LIMIT 1) AS valueCents,
           (SELECT SUM(ra.width_ft * ra.length_ft) FROM turf_reservations tr
              JOIN roll_allocations ra
                ON ra.company_id = tr.company_id AND ra.reservation_id = tr.id
             WHERE tr.company_id = j.company_id AND tr.job_id = j.id AND tr.status = 'cut')
             AS cutSqFt,
           (SELECT SUM(r.width_ft * r.length_ft) FROM rolls r
             WHERE r.company_id = j.company_id AND r.source_job_id = j.id AND r.is_remnant)
             AS returnedSqFt
         FROM jobs j
         JOIN (SELECT DISTINCT ev.entity_id AS job_id FROM audit_events ev
                WHERE ev.company_id = :companyId AND ev.action = 'job.status_changed'
                  AND ev.created_at >= :fromInstant AND ev.created_at < :toInstant
                  AND JSON_VALUE(ev.data, '$.to') = 'installed') installed
           ON installed.job_id = j.id
        WHERE j.company_id = :companyId AND j.status IN ('installed', 'invoiced', 'paid', 'closed')
       ) t`,
    { fromInstant: range.fromInstant, toInstant: range.toInstant },
  );
  const n = (key: keyof InstalledFigures) => Number(row?.[key] ?? 0);
  return {
    jobs: n('jobs'),
    sqFt: n('sqFt'),
    valueCents: n('valueCents'),
    pricedSqFt: n('pricedSqFt'),
    pricedValueCents: n('pricedValueCents'),
    materialJobs: n('materialJobs'),
    plannedSqFt: n('plannedSqFt'),
    cutSqFt: n('cutSqFt'),
    returnedSqFt: n('returnedSqFt'),
  };
}
