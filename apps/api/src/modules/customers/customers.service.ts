import { can } from '@seamwright/shared';
import type {
  CreateCustomerData,
  CustomerListQuery,
  CustomerView,
  ListResponse,
  UpdateCustomerData,
} from '@seamwright/shared';
import type { Sequelize } from 'sequelize';
import type { RequestContext } from '../../context.js';
import { inTransaction } from '../../db/sequelize.js';
import { notFound } from '../../errors.js';
import { recordAuditEvent } from '../audit/audit.repository.js';
import { refuseWhenJobsRemain } from '../jobs/jobs-remain.js';
import type { CustomerRow } from './customers.repository.js';
import {
  adjustCustomerCounts,
  createCustomer,
  deleteCustomerWithSites,
  findCustomer,
  updateCustomer,
  writeSearchWords,
} from './customers.repository.js';
import { findCustomerView, listCustomers } from './customers-list.repository.js';

/** Billing details are blanked for roles that may not read them. */
function toView(
  ctx: RequestContext,
  row: Omit<CustomerRow, 'companyId'>,
  siteCount: number,
): CustomerView {
  const showBilling = can(ctx.role, 'customers.billing.read');
  return {
    id: row.id,
    name: row.name,
    email: showBilling ? row.email : null,
    phone: showBilling ? row.phone : null,
    billingAddress: showBilling ? row.billingAddress : null,
    notes: row.notes,
    siteCount,
    archivedAt: row.archivedAt ? row.archivedAt.toISOString() : null,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

export function createCustomersService(sequelize: Sequelize) {
  async function list(
    ctx: RequestContext,
    query: CustomerListQuery,
  ): Promise<ListResponse<CustomerView>> {
    const { rows, total } = await listCustomers(ctx, query);
    return {
      data: rows.map((r) => toView(ctx, r, r.siteCount)),
      meta: { page: query.page, pageSize: query.pageSize, total },
    };
  }

  async function get(ctx: RequestContext, id: string): Promise<CustomerView> {
    const row = await findCustomerView(ctx, id);
    if (!row) throw notFound('Customer');
    return toView(ctx, row, row.siteCount);
  }

  async function create(ctx: RequestContext, input: CreateCustomerData): Promise<CustomerView> {
    const row = await inTransaction(sequelize, async (tx) => {
      const created = await createCustomer(
        ctx,
        {
          name: input.name,
          email: input.email ?? null,
          phone: input.phone ?? null,
          billingAddress: input.billingAddress ?? null,
          notes: input.notes ?? null,
        },
        tx,
      );
      await adjustCustomerCounts(ctx, { active: 1, archived: 0 }, tx);
      await writeSearchWords(ctx, created, tx, false);
      await recordAuditEvent(
        ctx,
        {
          action: 'customer.created',
          entity: 'customer',
          entityId: created.id,
          data: { name: created.name },
        },
        tx,
      );
      return created;
    });
    return toView(ctx, row, 0);
  }

  async function update(
    ctx: RequestContext,
    id: string,
    input: UpdateCustomerData,
  ): Promise<CustomerView> {
    await inTransaction(sequelize, async (tx) => {
      const current = await findCustomer(ctx, id, tx);
      if (!current) throw notFound('Customer');
      const { archived, ...fields } = input;
      const changes: Partial<CustomerRow> = Object.fromEntries(
        Object.entries(fields).filter(([, v]) => v !== undefined),
      );
      let action = 'customer.updated';
      if (archived === true && !current.archivedAt) {
        changes.archivedAt = new Date();
        action = 'customer.archived';
        await adjustCustomerCounts(ctx, { active: -1, archived: 1 }, tx);
      } else if (archived === false && current.archivedAt) {
        changes.archivedAt = null;
        action = 'customer.restored';
        await adjustCustomerCounts(ctx, { active: 1, archived: -1 }, tx);
      }
      await updateCustomer(ctx, id, changes, tx);
      if (changes.name !== undefined || changes.email !== undefined || changes.phone !== undefined)
        await writeSearchWords(ctx, { ...current, ...changes }, tx, true);
      await recordAuditEvent(
        ctx,
        { action, entity: 'customer', entityId: id, data: { fields: Object.keys(changes) } },
        tx,
      );
    });
    return get(ctx, id);
  }

  async function remove(ctx: RequestContext, id: string): Promise<void> {
    await refuseWhenJobsRemain(
      'This customer has jobs, so they cannot be deleted; archive them instead',
      inTransaction(sequelize, async (tx) => {
        const current = await findCustomer(ctx, id, tx);
        if (!current) throw notFound('Customer');
        await deleteCustomerWithSites(ctx, id, tx);
        const wasArchived = current.archivedAt !== null;
        await adjustCustomerCounts(
          ctx,
          { active: wasArchived ? 0 : -1, archived: wasArchived ? -1 : 0 },
          tx,
        );
        await recordAuditEvent(
          ctx,
          {
            action: 'customer.deleted',
            entity: 'customer',
            entityId: id,
            data: { name: current.name },
          },
          tx,
        );
      }),
    );
  }

  return { list, get, create, update, remove };
}
