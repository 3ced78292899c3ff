import { Sequelize } from 'sequelize';
import { beforeAll, describe, expect, it } from 'vitest';
import { CustomerModel, initModels, SiteModel } from './models/index.js';
import { assertTenantScoped, TenantScopeError } from './tenant-guard.js';

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

  it('lets through a statement that pins company_id, or one that gives a reason', () => {
    expect(() =>
      assertTenantScoped('M', 'find', { where: { id: 'x', companyId: 'c' } }),
    ).not.toThrow();
    // Destroy maps attribute names to columns before its hook runs.
    expect(() => assertTenantScoped('M', 'destroy', { where: { company_id: 'c' } })).not.toThrow();
    expect(() => assertTenantScoped('M', 'count', { unscopedReason: 'a test' })).not.toThrow();
    expect(() => assertTenantScoped('M', 'find', { where: { companyId: undefined } })).toThrow(
      TenantScopeError,
    );
  });

  it('does not stack hooks when the models are registered again', () => {
    initModels(new Sequelize({ dialect: 'mariadb', logging: false }));
    const hooks = (CustomerModel.options.hooks as Record<string, unknown[]>).beforeFind;
    expect(hooks).toHaveLength(1);
  });
});
