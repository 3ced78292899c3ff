// The demo seed writes its rows through scoped(ctx, Model) like request code does.
import { describe, expect, it } from 'vitest';
import {
  demoAreas,
  demoReservedJobTitles,
  demoUsers,
  seedDemoData,
  selectRows,
} from '@seamwright/api';
import { testApp } from '../../fixtures/app.js';

describe('demo seed', () => {
  it('files every membership, customer, site, job and planned area under the demo company, once', async () => {
    const { sequelize, plannerPool } = testApp();
    const first = await seedDemoData(sequelize, { bcryptCost: 4 }, plannerPool);
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

    // Every demo area is saved with a real plan of its drawing.
    const areas = await selectRows<{ area_sq_ft: number; ordered_sq_ft: number }>(
      sequelize,
      'SELECT area_sq_ft, ordered_sq_ft FROM job_areas WHERE company_id = ?',
      [company?.id],
    );
    expect(areas.length).toBe(demoAreas.length);
    for (const area of areas)
      expect(Number(area.ordered_sq_ft)).toBeGreaterThanOrEqual(Number(area.area_sq_ft));

    // Stock in several dye lots, and the sold jobs' turf held on it.
    expect(Number(await count('rolls', company?.id))).toBeGreaterThan(3);
    const held = await selectRows<{ title: string }>(
      sequelize,
      `SELECT DISTINCT j.title FROM turf_reservations r JOIN jobs j ON j.id = r.job_id
        WHERE r.company_id = ? AND r.status = 'held' ORDER BY j.title`,
      [company?.id],
    );
    expect(held.map((row) => row.title)).toEqual([...demoReservedJobTitles].sort());

    // A two-option draft, one sent and waiting (its customer's page given), one signed.
    const estimates = await selectRows<{ title: string; status: string; tiers: unknown }>(
      sequelize,
      `SELECT j.title, e.status, e.tiers FROM estimates e JOIN jobs j ON j.id = e.job_id
        WHERE e.company_id = ? ORDER BY j.title`,
      [company?.id],
    );
    expect(estimates.map((e) => [e.title, e.status])).toEqual([
      ['Back yard lawn and path', 'draft'],
      ['Front courtyard lawn', 'accepted'],
      ['Front lawn on the slope', 'sent'],
    ]);
    const tiers = estimates[0]?.tiers;
    expect((typeof tiers === 'string' ? JSON.parse(tiers) : tiers) as unknown[]).toHaveLength(2);
    expect(first.customerLinks).toEqual([
      { jobTitle: 'Front lawn on the slope', path: expect.stringMatching(/^\/e\/[\w-]{40,}$/) },
    ]);
    const [accepted] = await selectRows<{ status: string }>(
      sequelize,
      "SELECT status FROM jobs WHERE company_id = ? AND title = 'Front courtyard lawn'",
      [company?.id],
    );
    expect(accepted?.status).toBe('accepted');
    // Invoices on the accepted job: the deposit sent, one partly paid by cheque, one overdue.
    const invoices = await selectRows<{ kind: string; status: string; due: string }>(
      sequelize,
      `SELECT kind, status, CAST(due_date < CURRENT_DATE AS CHAR) AS due FROM invoices
        WHERE company_id = ? ORDER BY number`,
      [company?.id],
    );
    expect(invoices.map((i) => [i.kind, i.status, i.due])).toEqual([
      ['deposit', 'sent', '0'],
      ['progress', 'partly_paid', '0'],
      ['progress', 'sent', '1'],
    ]);
    expect(first.payLinks).toEqual([
      { jobTitle: 'Front courtyard lawn', path: expect.stringMatching(/^\/i\/[\w-]{40,}$/) },
    ]);

    const again = await seedDemoData(sequelize, { bcryptCost: 4 }, plannerPool);
    expect(again.created).toBe(false);
    expect(again.customerLinks).toEqual([]);
    expect(again.payLinks).toEqual([]);
    expect(Number(await count('invoices', company?.id))).toBe(3);
    // A rerun adds nothing.
    expect(Number(await count('turf_reservations', company?.id))).toBe(held.length);
  });
});
