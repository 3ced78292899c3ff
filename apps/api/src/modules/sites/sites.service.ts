import type { CreateSiteData, ListResponse, SiteView, UpdateSiteData } from '@seamwright/shared';
import type { Sequelize } from 'sequelize';
import type { RequestContext } from '../../context.js';
import { inTransaction } from '../../db/sequelize.js';
import { notFound } from '../../errors.js';
import { recordAuditEvent } from '../audit/audit.repository.js';
import { refuseWhenJobsRemain } from '../jobs/jobs-remain.js';
import { findCustomer } from '../customers/customers.repository.js';
import type { SiteRow, SiteValues } from './sites.repository.js';
import {
  createSite,
  deleteSite,
  findSite,
  listSitesOfCustomer,
  updateSite,
} from './sites.repository.js';

function toView(row: SiteRow): SiteView {
  return {
    id: row.id,
    customerId: row.customerId,
    label: row.label,
    addressLine1: row.addressLine1,
    addressLine2: row.addressLine2,
    city: row.city,
    region: row.region,
    postalCode: row.postalCode,
    accessNotes: row.accessNotes,
    pets: row.pets,
    hazards: row.hazards,
    sprinklerHeads: row.sprinklerHeads,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

function toValues(input: CreateSiteData): SiteValues {
  return {
    label: input.label ?? null,
    addressLine1: input.addressLine1,
    addressLine2: input.addressLine2 ?? null,
    city: input.city,
    region: input.region ?? null,
    postalCode: input.postalCode ?? null,
    accessNotes: input.accessNotes ?? null,
    pets: input.pets ?? null,
    hazards: input.hazards ?? null,
    sprinklerHeads: input.sprinklerHeads,
  };
}

export function createSitesService(sequelize: Sequelize) {
  async function listForCustomer(
    ctx: RequestContext,
    customerId: string,
    query: { page: number; pageSize: number },
  ): Promise<ListResponse<SiteView>> {
    if (!(await findCustomer(ctx, customerId))) throw notFound('Customer');
    const { rows, total } = await listSitesOfCustomer(ctx, customerId, {
      limit: query.pageSize,
      offset: (query.page - 1) * query.pageSize,
    });
    return { data: rows.map(toView), meta: { page: query.page, pageSize: query.pageSize, total } };
  }

  async function get(ctx: RequestContext, id: string): Promise<SiteView> {
    const row = await findSite(ctx, id);
    if (!row) throw notFound('Site');
    return toView(row);
  }

  async function create(
    ctx: RequestContext,
    customerId: string,
    input: CreateSiteData,
  ): Promise<SiteView> {
    const row = await inTransaction(sequelize, async (tx) => {
      if (!(await findCustomer(ctx, customerId, tx))) throw notFound('Customer');
      const created = await createSite(ctx, customerId, toValues(input), tx);
      await recordAuditEvent(
        ctx,
        { action: 'site.created', entity: 'site', entityId: created.id, data: { customerId } },
        tx,
      );
      return created;
    });
    return toView(row);
  }

  async function update(ctx: RequestContext, id: string, input: UpdateSiteData): Promise<SiteView> {
    await inTransaction(sequelize, async (tx) => {
      if (!(await findSite(ctx, id, tx))) throw notFound('Site');
      const changes = Object.fromEntries(
        Object.entries(input).filter(([, v]) => v !== undefined),
      ) as Partial<SiteValues>;
      await updateSite(ctx, id, changes, tx);
      await recordAuditEvent(
        ctx,
        {
          action: 'site.updated',
          entity: 'site',
          entityId: id,
          data: { fields: Object.keys(changes) },
        },
        tx,
      );
    });
    return get(ctx, id);
  }

  async function remove(ctx: RequestContext, id: string): Promise<void> {
    await refuseWhenJobsRemain(
      'This site has jobs, so it cannot be deleted',
      inTransaction(sequelize, async (tx) => {
        const site = await findSite(ctx, id, tx);
        if (!site) throw notFound('Site');
        await deleteSite(ctx, id, tx);
        await recordAuditEvent(
          ctx,
          {
            action: 'site.deleted',
            entity: 'site',
            entityId: id,
            data: { customerId: site.customerId },
          },
          tx,
        );
      }),
    );
  }

  return { listForCustomer, get, create, update, remove };
}
