// Seamwright's own lint rules, loaded by eslint.config.js as the `seamwright` plugin.
import { tenantScopeRule } from './tenant-scope.js';

export const seamwrightPlugin = {
  meta: { name: 'seamwright' },
  rules: { 'tenant-scope': tenantScopeRule },
};
