import { Sequelize } from 'sequelize';
import { beforeAll, describe, expect, it } from 'vitest';
import { CompanyModel, CustomerModel, initModels, SiteModel } from './models/index.js';
import { TenantScopeError } from './tenant-guard.js';

// The guard throws before any SQL is sent, so these models are registered on an instance that
// never connects; the statements it lets through are exercised by the API suite on MariaDB.
beforeAll(() => {
  initModels(new Sequelize({ dialect: 'mariadb', logging: false }));
});

describe('tenant guard', () => {
  it('refuses a find, count, update or destroy on a tenant model without company_id', async () => {
    await expect(CustomerModel.findAll({ where: { name: 'x' } })).rejects.toThrow(TenantScopeError);
    await expect(CustomerModel.findByPk('id')).rejects.toThrow(TenantScopeError);
    await expect(SiteModel.count()).rejects.toThrow(TenantScopeError);
    await expect(SiteModel.update({ pets: null }, { where: { id: 'x' } })).rejects.toThrow(
      TenantScopeError,
    );
    await expect(SiteModel.destroy({ where: { id: 'x' } })).rejects.toThrow(TenantScopeError);
  });

  it('lets through a statement that pins company_id, or one that gives a reason', async () => {
    await expect(
      CustomerModel.runHooks('beforeFind', { where: { id: 'x', companyId: 'c' } }),
    ).resolves.toBeUndefined();
    // Destroy maps attribute names to columns before its hook runs.
    await expect(
      SiteModel.runHooks('beforeBulkDestroy', { where: { id: 'x', company_id: 'c' } }),
    ).resolves.toBeUndefined();
    await expect(
      CustomerModel.runHooks('beforeCount', { where: {}, unscopedReason: 'a test' }),
    ).resolves.toBeUndefined();
  });

  it('leaves models without company_id alone', async () => {
    await expect(
      CompanyModel.runHooks('beforeFind', { where: { slug: 'x' } }),
    ).resolves.toBeUndefined();
  });

  it('does not stack hooks when the models are registered again', () => {
    initModels(new Sequelize({ dialect: 'mariadb', logging: false }));
    const hooks = (CustomerModel.options.hooks as Record<string, unknown[]>).beforeFind;
    expect(hooks).toHaveLength(1);
  });
});
