/* eslint-disable @typescript-eslint/no-unsafe-call -- supertest response bodies are untyped JSON */
import { beforeAll, describe, expect, it } from 'vitest';
import { selectRows } from '@seamwright/api';
import type { EstimatingSettingsView } from '@seamwright/shared';
import { defaultTakeoffSettings } from '@seamwright/takeoff';
import { testApp } from '../../fixtures/app.js';
import { signUpTeam } from '../../fixtures/factories.js';
import type { SignedIn } from '../../fixtures/factories.js';

async function storedRow(companyId: string) {
  return selectRows(
    testApp().sequelize,
    'SELECT takeoff_overrides, markup_basis_points, tax_rate_basis_points, deposit_rule, updated_at FROM estimating_settings WHERE company_id = ?',
    [companyId],
  );
}

describe('estimating settings', () => {
  let owner: SignedIn;
  let office: SignedIn;
  let bookkeeper: SignedIn;
  let crew: SignedIn;

  beforeAll(async () => {
    const { app } = testApp();
    ({ owner, office, bookkeeper, crew } = await signUpTeam(app));
  });

  it('starts a new company on the standard values with a 30 % deposit, each setting with its source', async () => {
    const res = await owner.client.get('/api/estimating-settings').expect(200);
    const view = res.body.data as EstimatingSettingsView;
    expect(view.takeoff).toEqual(defaultTakeoffSettings);
    expect(view.takeoffOverrides).toEqual({});
    expect(view.depositRule).toEqual({ kind: 'percent', basisPoints: 3000 });
    expect(view).toMatchObject({ markupBasisPoints: 0, taxRateBasisPoints: 0 });
    const spoil = view.takeoffFields.find(
      (f) => f.path === 'excavation.spoilLooseDensityLbPerCuYd',
    );
    // CalRecycle volume-to-weight table: loose dry earth 2,100 lb per cu yd
    expect(spoil).toMatchObject({ value: 2100, standard: 2100, isOverridden: false });
    expect(spoil?.source).toContain('CalRecycle');
    expect(view.takeoffFields.every((f) => f.source.length > 0)).toBe(true);
    expect(await storedRow(owner.me.company.id)).toHaveLength(1);
  });

  it('saves partial changes as overrides, and a null resets a setting to the standard', async () => {
    const res = await office.client
      .patch('/api/estimating-settings', {
        takeoff: { base: { depthIn: 4 }, perimeterNails: { straightSpacingIn: 5 } },
        markupBasisPoints: 2500,
        taxRateBasisPoints: 825,
        depositRule: { kind: 'amount', cents: 50_000 },
      })
      .expect(200);
    const view = res.body.data as EstimatingSettingsView;
    expect(view.takeoff).toMatchObject({ base: { ...defaultTakeoffSettings.base, depthIn: 4 } });
    expect(view.takeoffOverrides).toEqual({
      base: { depthIn: 4 },
      perimeterNails: { straightSpacingIn: 5 },
    });
    expect(view.takeoffFields.find((f) => f.path === 'base.depthIn')).toMatchObject({
      value: 4,
      standard: 3,
      isOverridden: true,
    });
    expect(view).toMatchObject({ markupBasisPoints: 2500, taxRateBasisPoints: 825 });

    const reset = await owner.client
      .patch('/api/estimating-settings', {
        takeoff: { base: { depthIn: null }, perimeterNails: { straightSpacingIn: 6 } },
      })
      .expect(200);
    // Typing the standard value back counts as a reset too.
    expect(reset.body.data.takeoffOverrides).toEqual({});
    expect(reset.body.data.depositRule).toEqual({ kind: 'amount', cents: 50_000 });
  });

  it('refuses a bad value with 400 naming the field, and saves nothing of the request', async () => {
    const before = await storedRow(owner.me.company.id);
    const cases: [object, string][] = [
      [
        { markupBasisPoints: 100, takeoff: { perimeterNails: { straightSpacingIn: 0 } } },
        'takeoff.perimeterNails.straightSpacingIn',
      ],
      [{ taxRateBasisPoints: 8.25 }, 'taxRateBasisPoints'],
      [{ depositRule: { kind: 'percent', basisPoints: 20_000 } }, 'depositRule.basisPoints'],
      [{ takeoff: { base: { depthInches: 3 } } }, 'takeoff.base.depthInches'],
      [{ takeoff: { labour: { seamFtPerHour: 'fast' } } }, 'takeoff.labour.seamFtPerHour'],
      [{ colour: 'green' }, ''],
    ];
    for (const [body, field] of cases) {
      const res = await owner.client.patch('/api/estimating-settings', body).expect(400);
      expect(res.body.code).toBe('VALIDATION_FAILED');
      if (field) expect(res.body.errors.map((e: { path: string }) => e.path)).toContain(field);
    }
    expect(await storedRow(owner.me.company.id)).toEqual(before);
  });

  it('lets bookkeepers read only and gives crew leads 403', async () => {
    await bookkeeper.client.get('/api/estimating-settings').expect(200);
    await bookkeeper.client.patch('/api/estimating-settings', { markupBasisPoints: 1 }).expect(403);
    for (const res of [
      await crew.client.get('/api/estimating-settings'),
      await crew.client.patch('/api/estimating-settings', { markupBasisPoints: 1 }),
    ]) {
      expect(res.status).toBe(403);
      expect(res.body.code).toBe('FORBIDDEN');
    }
  });
});
