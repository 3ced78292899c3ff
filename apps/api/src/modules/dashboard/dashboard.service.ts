// The owner's numbers for a period: each figure is one statement, all run in parallel after
// the company row (its time zone fixes the period's days, its region the water rule).
import { waterSavedPerYear, waterSavingsRuleFor } from '@seamwright/domain';
import type { DashboardQuery, DashboardView } from '@seamwright/shared';
import type { Sequelize } from 'sequelize';
import type { RequestContext } from '../../context.js';
import { notFound } from '../../errors.js';
import { findOwnCompany } from '../company/company.repository.js';
import { crewUtilisation } from './crew-utilisation.query.js';
import { collectedByMonth, invoicedByMonth } from './dashboard-money.queries.js';
import { installedFigures, pipelineByStatus, rules, winRate } from './dashboard-jobs.queries.js';
import { dashboardRange } from './dashboard-range.js';

/** `a / b` in whole units, half-up (non-negative figures only). */
function ratioHalfUp(a: number, b: number): number {
  return Math.floor(a / b + 0.5);
}

export async function getDashboard(
  ctx: RequestContext,
  sequelize: Sequelize,
  query: DashboardQuery,
  now = new Date(),
): Promise<DashboardView> {
  const company = await findOwnCompany(ctx);
  if (!company) throw notFound('Company');
  const range = dashboardRange(company.timeZone, query, now);
  const crewId = query.crewId ?? null;
  const [invoiced, collected, pipeline, win, installed, crews] = await Promise.all([
    invoicedByMonth(ctx, sequelize, range),
    collectedByMonth(ctx, sequelize, range),
    pipelineByStatus(ctx, sequelize),
    winRate(ctx, sequelize, range),
    installedFigures(ctx, sequelize, range),
    crewUtilisation(ctx, sequelize, range, crewId),
  ]);
  const actualSqFt = installed.cutSqFt - installed.returnedSqFt;
  const marginSqFt = installed.plannedSqFt - actualSqFt;
  const water = waterSavedPerYear(installed.sqFt, company.region);
  const waterRule = water?.rule ?? waterSavingsRuleFor(company.region);
  return {
    from: range.from,
    to: range.to,
    crewId,
    invoicedByMonth: invoiced,
    collectedByMonth: collected,
    pipeline,
    winRate: win,
    installed: {
      jobs: installed.jobs,
      sqFt: Math.round(installed.sqFt),
      valueCents: installed.valueCents,
      averageCentsPerSqFt:
        installed.pricedSqFt > 0
          ? ratioHalfUp(installed.pricedValueCents, installed.pricedSqFt)
          : null,
      rule: `${rules.installed} Average: value ÷ area of the jobs that have both, half-up to the cent.`,
    },
    material: {
      jobs: installed.materialJobs,
      estimatedSqFt: Math.round(installed.plannedSqFt),
      actualSqFt: Math.round(actualSqFt),
      marginSqFt: Math.round(marginSqFt),
      marginBasisPoints:
        installed.plannedSqFt > 0
          ? Math.round((marginSqFt / installed.plannedSqFt) * 10_000)
          : null,
      rule: rules.material,
    },
    crewUtilisation: crews,
    waterSaved: {
      region: company.region,
      gallonsPerYear: water?.gallonsPerYear ?? null,
      rule: waterRule
        ? {
            label: waterRule.label,
            lawnGallonsPerSqFtYear: waterRule.lawnGallonsPerSqFtYear,
            replacementGallonsPerSqFtYear: waterRule.replacementGallonsPerSqFtYear,
            source: waterRule.source,
          }
        : null,
      note: waterRule
        ? `Lawn ${waterRule.lawnGallonsPerSqFtYear} − water-smart landscape ${waterRule.replacementGallonsPerSqFtYear} gal per sq ft per year, times the sq ft installed (${waterRule.label}; TRADE.md §8.7).`
        : `No published water figure is stored for ${company.region ?? 'the company’s region (none set)'}, so no saving is shown.`,
    },
  };
}
