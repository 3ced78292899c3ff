import { describe, expect, it } from 'vitest';
import { selectRows } from '@seamwright/api';
import { testApp } from '../../fixtures/app.js';
import { createCustomer, signUpCompany } from '../../fixtures/factories.js';

describe('sites', () => {
  it("creates, lists, reads, updates and deletes a customer's sites", async () => {
    const { app } = testApp();
    const owner = await signUpCompany(app);
    const customer = await createCustomer(owner.client);
    const created = await owner.client
      .post(`/api/customers/${customer.id}/sites`, {
        label: 'Back yard',
        addressLine1: '14 Larkspur Bend',
        city: 'Quillmere',
        accessNotes: 'Side gate code 4471',
        pets: 'Two beagles',
        hazards: 'Shallow gas line along the north fence',
        sprinklerHeads: 9,
      })
      .expect(201);
    const site = created.body.data;
    expect(site).toMatchObject({
      customerId: customer.id,
      label: 'Back yard',
      sprinklerHeads: 9,
      postalCode: null,
    });

    await owner.client
      .post(`/api/customers/${customer.id}/sites`, {
        addressLine1: '16 Larkspur Bend',
        city: 'Quillmere',
      })
      .expect(201);
    const list = await owner.client.get(`/api/customers/${customer.id}/sites`).expect(200);
    expect(list.body.meta.total).toBe(2);
    expect(list.body.data[0].id).toBe(site.id);

    const updated = await owner.client
      .patch(`/api/sites/${site.id}`, { pets: '', sprinklerHeads: 11 })
      .expect(200);
    expect(updated.body.data).toMatchObject({
      pets: null,
      sprinklerHeads: 11,
      hazards: 'Shallow gas line along the north fence',
    });
    await owner.client.del(`/api/sites/${site.id}`).expect(204);
    await owner.client.get(`/api/sites/${site.id}`).expect(404);
  });

  it('rejects bad input with field paths and saves nothing', async () => {
    const { app, sequelize } = testApp();
    const owner = await signUpCompany(app);
    const customer = await createCustomer(owner.client);
    const res = await owner.client
      .post(`/api/customers/${customer.id}/sites`, { city: 'Quillmere', sprinklerHeads: -2 })
      .expect(400);
    expect((res.body.errors as { path: string }[]).map((e) => e.path).sort()).toEqual([
      'addressLine1',
      'sprinklerHeads',
    ]);
    expect(
      await selectRows(sequelize, 'SELECT id FROM sites WHERE customer_id = ?', [customer.id]),
    ).toHaveLength(0);
  });

  it('answers 404 when the customer does not exist', async () => {
    const { app } = testApp();
    const owner = await signUpCompany(app);
    await owner.client
      .post('/api/customers/00000000-0000-4000-8000-000000000000/sites', {
        addressLine1: '1 A St',
        city: 'B',
      })
      .expect(404);
    await owner.client.get('/api/customers/nope/sites').expect(404);
  });
});
