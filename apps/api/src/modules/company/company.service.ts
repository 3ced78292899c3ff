import type { CompanySettingsView, UpdateCompanyInput } from '@seamwright/shared';
import type { Sequelize } from 'sequelize';
import type { RequestContext } from '../../context.js';
import { inTransaction } from '../../db/sequelize.js';
import { notFound } from '../../errors.js';
import { recordAuditEvent } from '../audit/audit.repository.js';
import { findOwnCompany, updateOwnCompany } from './company.repository.js';

type CompanyRow = NonNullable<Awaited<ReturnType<typeof findOwnCompany>>>;

function toView(c: CompanyRow): CompanySettingsView {
  return {
    id: c.id,
    name: c.name,
    slug: c.slug,
    address: c.address,
    timeZone: c.timeZone,
    region: c.region,
    currency: c.currency,
    measurementSystem: c.measurementSystem,
  };
}

export function createCompanyService(sequelize: Sequelize) {
  async function get(ctx: RequestContext): Promise<CompanySettingsView> {
    const company = await findOwnCompany(ctx);
    if (!company) throw notFound('Company');
    return toView(company);
  }

  async function update(
    ctx: RequestContext,
    input: UpdateCompanyInput,
  ): Promise<CompanySettingsView> {
    await inTransaction(sequelize, async (tx) => {
      if (!(await findOwnCompany(ctx, tx))) throw notFound('Company');
      const changes = Object.fromEntries(
        Object.entries(input).filter(([, value]) => value !== undefined),
      );
      await updateOwnCompany(ctx, changes, tx);
      await recordAuditEvent(
        ctx,
        {
          action: 'company.updated',
          entity: 'company',
          entityId: ctx.companyId,
          data: { fields: Object.keys(changes) },
        },
        tx,
      );
    });
    return get(ctx);
  }

  return { get, update };
}
