import { describe, expect, it } from 'vitest';
import type { ListResponse, SiteView } from '@seamwright/shared';
import { testApp } from '../../fixtures/app.js';
import { bulkInsertSites, createCustomer, signUpCompany } from '../../fixtures/factories.js';

describe("paging a customer's sites", () => {
  it('pages past 100 sites and tells the total, so no site is cut off silently', async () => {
    const { app, sequelize } = testApp();
    const owner = await signUpCompany(app);
    const customer = await createCustomer(owner.client);
    await bulkInsertSites(sequelize, owner.me.company.id, customer.id, 130);

    const first = await owner.client
      .get(`/api/customers/${customer.id}/sites?page=1&pageSize=100`)
      .expect(200);
    const firstBody = first.body as ListResponse<SiteView>;
    expect(firstBody.meta).toEqual({ page: 1, pageSize: 100, total: 130 });
    expect(firstBody.data).toHaveLength(100);
    expect(firstBody.data[0]?.addressLine1).toBe('1 Bulk Row');

    const second = await owner.client
      .get(`/api/customers/${customer.id}/sites?page=2&pageSize=100`)
      .expect(200);
    const secondBody = second.body as ListResponse<SiteView>;
    expect(secondBody.meta.total).toBe(130);
    expect(secondBody.data.map((s) => s.addressLine1)).toEqual(
      Array.from({ length: 30 }, (_, i) => `${i + 101} Bulk Row`),
    );
    const ids = new Set([...firstBody.data, ...secondBody.data].map((s) => s.id));
    expect(ids.size).toBe(130);
  });

  it('refuses a page size over 100 with the field named', async () => {
    const { app } = testApp();
    const owner = await signUpCompany(app);
    const customer = await createCustomer(owner.client);
    const res = await owner.client
      .get(`/api/customers/${customer.id}/sites?pageSize=500`)
      .expect(400);
    expect((res.body.errors as { path: string }[]).map((e) => e.path)).toEqual(['pageSize']);
  });
});
