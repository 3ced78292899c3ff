import { fileURLToPath } from 'node:url';
import { defineProject } from 'vitest/config';
import react from '@vitejs/plugin-react';

// The web project of the root vitest.config.ts: components and client helpers in happy-dom.
// `root` is this folder, so `include` is relative to apps/web.
export default defineProject({
  root: fileURLToPath(new URL('.', import.meta.url)),
  plugins: [react()],
  test: {
    name: 'web',
    environment: 'happy-dom',
    include: ['src/**/*.test.{ts,tsx}'],
    setupFiles: ['src/test/setup.ts'],
  },
});
