// The receivables and dashboard actions (issue 10): bookkeeper and owner read receivables and
// exports and send statements; the dashboard is the owner's; the office and crew leads get 403
// on every one of these routes (the office reads invoice status only, through invoices.read).
import { beforeAll, describe, expect, it } from 'vitest';
import { can, permissionTable } from '@seamwright/shared';
import { testApp } from '../../fixtures/app.js';
import { createCustomer, signUpTeam } from '../../fixtures/factories.js';
import type { Team } from '../../fixtures/factories.js';

describe('reports permissions', () => {
  let team: Team;
  let customerId: string;

  beforeAll(async () => {
    team = await signUpTeam(testApp().app);
    customerId = (await createCustomer(team.owner.client, { name: 'Role Check Yard' })).id;
  });

  it('states who may do what in the one table', () => {
    expect(permissionTable['receivables.read']).toEqual(['owner', 'bookkeeper']);
    expect(permissionTable['statements.send']).toEqual(['owner', 'bookkeeper']);
    expect(permissionTable['exports.read']).toEqual(['owner', 'bookkeeper']);
    expect(permissionTable['dashboard.read']).toEqual(['owner']);
    expect(can('office', 'invoices.read')).toBe(true);
    expect(can('crew_lead', 'invoices.read')).toBe(false);
  });

  it('answers each role as the table says on every report route', async () => {
    const reads = [
      ['/api/reports/aging', 'receivables.read'],
      [`/api/customers/${customerId}/statement.pdf`, 'receivables.read'],
      ['/api/exports/invoices.csv', 'exports.read'],
      ['/api/exports/payments.csv', 'exports.read'],
      ['/api/reports/dashboard', 'dashboard.read'],
    ] as const;
    for (const role of ['owner', 'office', 'bookkeeper', 'crew'] as const) {
      const member = team[role];
      for (const [path, action] of reads) {
        const res = await member.client.get(path);
        const allowed = can(member.me.role, action);
        expect({ role, path, status: res.status }).toEqual({
          role,
          path,
          status: allowed ? 200 : 403,
        });
      }
    }
  });
});
