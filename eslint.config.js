// One lint setup for the whole workspace: type-checked typescript-eslint, React hooks rules in
// the web app, and the architecture rules from DEVELOPERS.md: pure packages do no I/O, tenant
// models are queried only through scoped(ctx, Model), web features do not import each other.
import { readFileSync } from 'node:fs';
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import reactHooks from 'eslint-plugin-react-hooks';
import importX, { createNodeResolver } from 'eslint-plugin-import-x';
import globals from 'globals';
import { seamwrightPlugin } from './tools/eslint-rules/index.js';
import { webBoundaryZones } from './tools/eslint-rules/web-boundaries.js';

/** The models with a company_id, listed once for the API code and this config. */
const tenantModels = JSON.parse(
  readFileSync(new URL('./apps/api/src/db/models/tenant-models.json', import.meta.url), 'utf8'),
);

const pureRestrictions = {
  patterns: [
    { group: ['node:*'], message: 'Pure packages do no I/O: no Node built-ins.' },
    {
      group: ['express', 'sequelize', 'react', 'react-dom'],
      message: 'Pure packages stay framework-free.',
    },
  ],
};

export default tseslint.config(
  {
    ignores: [
      '**/node_modules/**',
      '**/dist/**',
      '.data/**',
      '.tmp/**',
      '**/test-results/**',
      '**/playwright-report/**',
    ],
  },
  js.configs.recommended,
  ...tseslint.configs.recommendedTypeChecked,
  {
    languageOptions: {
      parserOptions: { projectService: true, tsconfigRootDir: import.meta.dirname },
      globals: { ...globals.node },
    },
    rules: {
      '@typescript-eslint/no-floating-promises': 'error',
      '@typescript-eslint/no-unused-vars': [
        'error',
        { argsIgnorePattern: '^_', varsIgnorePattern: '^_' },
      ],
      '@typescript-eslint/consistent-type-imports': 'error',
      'max-lines': ['warn', { max: 300, skipBlankLines: true, skipComments: true }],
    },
  },
  {
    files: ['**/*.js', '**/*.mjs'],
    ...tseslint.configs.disableTypeChecked,
  },
  {
    files: ['apps/web/**/*.{ts,tsx}'],
    plugins: { 'react-hooks': reactHooks },
    languageOptions: { globals: { ...globals.browser } },
    rules: {
      ...reactHooks.configs.recommended.rules,
      '@typescript-eslint/no-misused-promises': [
        'error',
        { checksVoidReturn: { attributes: false } },
      ],
    },
  },
  {
    // Feature boundaries of the web app, checked on resolved paths (see web-boundaries.js).
    files: ['apps/web/src/**/*.{ts,tsx}'],
    plugins: { 'import-x': importX },
    settings: {
      'import-x/resolver-next': [createNodeResolver({ extensions: ['.ts', '.tsx', '.js'] })],
    },
    rules: {
      'import-x/no-restricted-paths': [
        'error',
        {
          basePath: import.meta.dirname,
          zones: webBoundaryZones('apps/web/src', import.meta.dirname),
        },
      ],
    },
  },
  {
    // Tenant rows only through scoped(ctx, Model); tests build rows for any company on purpose.
    files: ['apps/api/src/**/*.ts'],
    ignores: ['**/*.test.ts'],
    plugins: { seamwright: seamwrightPlugin },
    rules: { 'seamwright/tenant-scope': ['error', { models: tenantModels }] },
  },
  {
    files: [
      'packages/takeoff/src/**/*.ts',
      'packages/domain/src/**/*.ts',
      'packages/shared/src/**/*.ts',
    ],
    ignores: ['**/*.test.ts', '**/cli/**'],
    rules: { 'no-restricted-imports': ['error', pureRestrictions] },
  },
  {
    files: ['**/*.test.ts', '**/*.test.tsx', 'tests/**/*.ts'],
    rules: {
      '@typescript-eslint/no-unsafe-member-access': 'off',
      '@typescript-eslint/no-unsafe-assignment': 'off',
      'max-lines': 'off',
    },
  },
);
