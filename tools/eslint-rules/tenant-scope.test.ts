import { RuleTester } from 'eslint';
import { describe, it } from 'vitest';
import { tenantScopeRule } from './tenant-scope.js';

// RuleTester reports through the test framework's describe/it when it is given them.
RuleTester.describe = describe;
RuleTester.it = it;
RuleTester.itOnly = it.only;

const ruleTester = new RuleTester({
  languageOptions: { ecmaVersion: 'latest', sourceType: 'module' },
});
const options = [{ models: ['CustomerModel', 'SiteModel'] }];

ruleTester.run('tenant-scope', tenantScopeRule, {
  valid: [
    {
      name: 'queries through scoped()',
      code: 'export function list(ctx) { return scoped(ctx, CustomerModel).findAll({}); }',
      options,
    },
    {
      name: 'a model that is not a tenant model',
      code: 'export function find(email) { return UserModel.findOne({ where: { email } }); }',
      options,
    },
    {
      name: 'registering the model is not a query',
      code: 'CustomerModel.init({}, { sequelize });',
      options,
    },
    {
      name: 'an unsafe function declaration with a reason',
      code: [
        '// Unscoped on purpose: builds the tenant context itself.',
        'export async function unsafeFindSite(id) { return SiteModel.findByPk(id); }',
      ].join('\n'),
      options,
    },
    {
      name: 'an unsafe arrow function with a reason, query nested in a callback',
      code: [
        '/** Unscoped on purpose: the token identifies the company. */',
        'export const unsafeCountSites = (ids) => Promise.all(ids.map((id) => SiteModel.count({ where: { id } })));',
      ].join('\n'),
      options,
    },
    {
      name: 'a custom prefix',
      code: '// Seeding.\nfunction systemSeed() { return CustomerModel.create({}); }',
      options: [{ models: ['CustomerModel'], unsafePrefix: 'system' }],
    },
  ],
  invalid: [
    ...[
      'findAll({})',
      'findOne({ where: { id } })',
      'findByPk(id)',
      'findAndCountAll({})',
      'count({})',
      'create({ companyId })',
      'bulkCreate([])',
      'update({ name }, { where: { id } })',
      'destroy({ where: { id } })',
      'increment("n", { where: { id } })',
      'max("n")',
      'sum("n")',
      'upsert({})',
    ].map((call) => ({
      name: `CustomerModel.${call.split('(')[0]} outside scoped()`,
      code: `export function go(id, name, companyId) { return CustomerModel.${call}; }`,
      options,
      errors: [{ messageId: 'direct' as const }],
    })),
    {
      name: 'computed member access',
      code: "SiteModel['findAll']();",
      options,
      errors: [{ messageId: 'direct' as const }],
    },
    {
      name: 'at module level',
      code: 'await SiteModel.findAll();',
      options,
      errors: [{ messageId: 'direct' as const }],
    },
    {
      name: 'a function only containing the word unsafe is not exempt',
      code: '// Why.\nfunction findUnsafeSites() { return SiteModel.findAll(); }',
      options,
      errors: [{ messageId: 'direct' as const }],
    },
    {
      name: 'an unsafe function without a comment saying why',
      code: 'export async function unsafeFindSite(id) { return SiteModel.findByPk(id); }',
      options,
      errors: [{ messageId: 'unsafeWithoutReason' as const }],
    },
    {
      name: 'an unsafe method without a comment',
      code: 'const repo = { unsafeAll() { return CustomerModel.findAll(); } };',
      options,
      errors: [{ messageId: 'unsafeWithoutReason' as const }],
    },
  ],
});
