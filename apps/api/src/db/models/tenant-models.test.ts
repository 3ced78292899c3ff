import { Sequelize } from 'sequelize';
import { describe, expect, it } from 'vitest';
import { initModels, tenantModelNames, tenantModels } from './index.js';

describe('tenantModelNames', () => {
  it('names exactly the models that carry a companyId, so the lint rule covers each of them', () => {
    // Models are only registered here; no connection is opened.
    const sequelize = new Sequelize({ dialect: 'mariadb', logging: false });
    initModels(sequelize);
    const withCompany = Object.values(sequelize.models)
      .filter((model) => 'companyId' in model.getAttributes())
      .map((model) => model.name)
      .sort();
    expect([...tenantModelNames].sort()).toEqual(withCompany);
    expect(tenantModels.map((model) => model.name).sort()).toEqual(withCompany);
  });
});
