// Customer search matches the beginnings of words (DEVELOPERS.md, "Customer search"), through the
// words table migration 0018 adds; the words follow every change in the change's transaction.
import { describe, expect, it } from 'vitest';
import { selectRows } from '@seamwright/api';
import type { CustomerView } from '@seamwright/shared';
import { testApp } from '../../fixtures/app.js';
import type { Client } from '../../fixtures/client.js';
import { createCustomer, signUpCompany } from '../../fixtures/factories.js';

async function found(client: Client, q: string): Promise<string[]> {
  const res = await client.get(`/api/customers?status=all&q=${encodeURIComponent(q)}`).expect(200);
  return (res.body.data as CustomerView[]).map((c) => c.name);
}

describe('customer search', () => {
  it('matches word beginnings of name and e-mail, and phone digits from a group on', async () => {
    const { client } = await signUpCompany(testApp().app);
    await createCustomer(client, {
      name: "Maeve O'Brien",
      email: 'maeve.ob@example.test',
      phone: '(555) 014-2222',
    });
    await createCustomer(client, { name: 'Brien Tallow' });
    expect(await found(client, 'bri')).toEqual(['Brien Tallow', "Maeve O'Brien"]);
    expect(await found(client, 'maeve bri')).toEqual(["Maeve O'Brien"]);
    // One letter: the name starts with it (not any word).
    expect(await found(client, 'B')).toEqual(['Brien Tallow']);
    expect(await found(client, 'br')).toEqual(['Brien Tallow', "Maeve O'Brien"]);
    // Not a substring search any more: the middle of a word finds no one.
    expect(await found(client, 'rien')).toEqual([]);
    expect(await found(client, 'ob@exa')).toEqual(["Maeve O'Brien"]);
    expect(await found(client, '014 2222')).toEqual(["Maeve O'Brien"]);
    expect(await found(client, '5550142')).toEqual(["Maeve O'Brien"]);
    expect(await found(client, '2222')).toEqual(["Maeve O'Brien"]);
  });

  it('follows renames, e-mail changes and deletes, and never finds another company', async () => {
    const { app, sequelize } = testApp();
    const { client } = await signUpCompany(app);
    const other = await signUpCompany(app);
    const customer = await createCustomer(client, { name: 'Quentin Sorrel' });
    await createCustomer(other.client, { name: 'Quentin Sorrel' });
    await client
      .patch(`/api/customers/${customer.id}`, { name: 'Quentin Yarrow', email: 'qy@example.test' })
      .expect(200);
    expect(await found(client, 'sorrel')).toEqual([]);
    expect(await found(client, 'yarrow')).toEqual(['Quentin Yarrow']);
    expect(await found(client, 'qy@')).toEqual(['Quentin Yarrow']);
    // Archiving keeps the words; the status filter decides.
    await client.patch(`/api/customers/${customer.id}`, { archived: true }).expect(200);
    expect(await found(client, 'yarrow')).toEqual(['Quentin Yarrow']);
    await client.del(`/api/customers/${customer.id}`).expect(204);
    expect(await found(client, 'quentin')).toEqual([]);
    const [left] = await selectRows<{ n: number }>(
      sequelize,
      'SELECT COUNT(*) AS n FROM customer_search_words WHERE customer_id = ?',
      [customer.id],
    );
    expect(Number(left?.n)).toBe(0);
    expect(await found(other.client, 'sorrel')).toEqual(['Quentin Sorrel']);
  });
});
