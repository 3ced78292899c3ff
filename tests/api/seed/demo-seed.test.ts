// The demo seed writes its rows through scoped(ctx, Model) like request code does.
import { describe, expect, it } from 'vitest';
import { demoUsers, seedDemoData, selectRows } from '@seamwright/api';
import { testApp } from '../../fixtures/app.js';

describe('demo seed', () => {
  it('files every membership, customer, site and job under the demo company, once', async () => {
    const { sequelize } = testApp();
    const first = await seedDemoData(sequelize, { bcryptCost: 4 });
    expect(first.created).toBe(true);
    const [company] = await selectRows<{ id: string }>(
      sequelize,
      "SELECT id FROM companies WHERE slug = 'bramblewick-turf-works'",
    );
    const count = async (table: string, companyId: string | undefined) =>
      (
        await selectRows<{ n: number }>(
          sequelize,
          `SELECT COUNT(*) AS n FROM ${table} WHERE company_id = ?`,
          [companyId],
        )
      )[0]?.n;
    expect(Number(await count('memberships', company?.id))).toBe(demoUsers.length);
    expect(Number(await count('customers', company?.id))).toBeGreaterThan(0);
    expect(Number(await count('sites', company?.id))).toBeGreaterThan(0);
    const statuses = await selectRows<{ status: string }>(
      sequelize,
      'SELECT DISTINCT status FROM jobs WHERE company_id = ?',
      [company?.id],
    );
    expect(statuses.length).toBeGreaterThanOrEqual(5);

    expect((await seedDemoData(sequelize, { bcryptCost: 4 })).created).toBe(false);
  });
});
