// The real eslint.config.js on small inline files: proves the architecture rules are switched on
// where DEVELOPERS.md says, not only that the rules work in isolation.
import { fileURLToPath } from 'node:url';
import { ESLint } from 'eslint';
import tseslint from 'typescript-eslint';
import { beforeAll, describe, expect, it } from 'vitest';

const root = fileURLToPath(new URL('../..', import.meta.url));
let eslint: ESLint;

beforeAll(async () => {
  // The snippets are not files of any tsconfig project, so type-aware linting is switched off;
  // the rules under test need no types.
  eslint = new ESLint({ cwd: root, overrideConfig: tseslint.configs.disableTypeChecked });
  // Loading the config and its plugins takes seconds on a busy machine: once, here.
  await eslint.lintText('', { filePath: 'apps/web/src/lib/warm-up.ts' });
}, 60_000);

async function ruleIds(code: string, filePath: string): Promise<string[]> {
  const [result] = await eslint.lintText(code, { filePath });
  return (result?.messages ?? []).map((message) => message.ruleId ?? message.message);
}

const web = 'apps/web/src';

describe('web import zones', () => {
  it('rejects a feature importing another feature', async () => {
    const code = "export { customerKeys } from '../../customers/api/customer-keys';\n";
    expect(await ruleIds(code, `${web}/features/sites/api/fixture.ts`)).toEqual([
      'import-x/no-restricted-paths',
    ]);
  });

  it('lets a feature import its own modules and components/, lib/, config/', async () => {
    const code = [
      "export { siteKeys } from './site-keys';",
      "export { api } from '../../../lib/api-client';",
      "export { Button } from '../../../components/ui/button';",
      "export { paths } from '../../../config/paths';",
      '',
    ].join('\n');
    expect(await ruleIds(code, `${web}/features/sites/api/fixture.ts`)).toEqual([]);
  });

  it('rejects a feature importing app/', async () => {
    const code = "export { sessionCan } from '../../../app/routes/guard';\n";
    expect(await ruleIds(code, `${web}/features/sites/api/fixture.ts`)).toEqual([
      'import-x/no-restricted-paths',
    ]);
  });

  it('rejects lib/ and components/ importing a feature or app/', async () => {
    const fromLib = "export { siteKeys } from '../features/sites/api/site-keys';\n";
    const fromComponents = "export { sessionCan } from '../../app/routes/guard';\n";
    expect(await ruleIds(fromLib, `${web}/lib/fixture.ts`)).toEqual([
      'import-x/no-restricted-paths',
    ]);
    expect(await ruleIds(fromComponents, `${web}/components/ui/fixture.ts`)).toEqual([
      'import-x/no-restricted-paths',
    ]);
  });

  it('lets an app/ route compose features', async () => {
    const code = [
      "export { customerKeys } from '../../features/customers/api/customer-keys';",
      "export { siteKeys } from '../../features/sites/api/site-keys';",
      '',
    ].join('\n');
    expect(await ruleIds(code, `${web}/app/routes/fixture.ts`)).toEqual([]);
  });
});

describe('tenant scoping in the API', () => {
  const imports = "import { SiteModel } from '../../db/models/index.js';\n";

  it('rejects a direct query on a tenant model', async () => {
    const code = `${imports}export const all = () => SiteModel.findAll();\n`;
    expect(await ruleIds(code, 'apps/api/src/modules/sites/fixture.ts')).toEqual([
      'seamwright/tenant-scope',
    ]);
  });

  it('allows it in a commented unsafe… function', async () => {
    const code = `${imports}// Unscoped on purpose: a fixture.\nexport const unsafeAll = () => SiteModel.findAll();\n`;
    expect(await ruleIds(code, 'apps/api/src/modules/sites/fixture.ts')).toEqual([]);
  });
});
