import { defineConfig } from '@playwright/test';

// End-to-end journeys in Debian's Chromium. scripts/run-tests.ts starts the API (serving the
// built web app), maildev and the processor fake, then passes their URLs in the environment.
const baseURL = process.env.E2E_BASE_URL ?? 'http://127.0.0.1:5171';

export default defineConfig({
  testDir: '.',
  testMatch: '**/*.spec.ts',
  timeout: 60_000,
  expect: { timeout: 10_000 },
  fullyParallel: false,
  workers: 1,
  retries: 0,
  forbidOnly: true,
  outputDir: '../../.tmp/e2e-results',
  reporter: [['list']],
  use: {
    baseURL,
    trace: 'retain-on-failure',
    screenshot: 'only-on-failure',
    launchOptions: {
      executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
      args: [
        '--headless',
        '--no-sandbox',
        '--disable-gpu',
        '--disable-quic',
        '--no-first-run',
        '--disable-background-networking',
        '--disable-component-update',
        '--disable-sync',
      ],
    },
  },
  projects: [{ name: 'desktop', use: { viewport: { width: 1280, height: 800 } } }],
});
