import { defineConfig } from '@playwright/test';

// infra/test.sh starts the real API (serving the built app) and passes its address here.
const baseURL = process.env['E2E_BASE_URL'] ?? 'http://127.0.0.1:3100';

export default defineConfig({
  testDir: 'e2e',
  // The screenshot walk only serves a person's visual check: it runs with SCREENSHOTS=1, and
  // the ordinary e2e run leaves it out instead of reporting it as skipped.
  testIgnore: process.env['SCREENSHOTS'] ? [] : ['**/*screenshots.spec.ts'],
  // One browser at a time: the tests share one API, one database and one mail inbox.
  workers: 1,
  fullyParallel: false,
  reporter: 'list',
  timeout: 30_000,
  expect: { timeout: 7_000 },
  retries: 0,
  outputDir: 'test-results',
  use: {
    baseURL,
    screenshot: 'only-on-failure',
    trace: 'retain-on-failure',
    locale: 'en-GB',
    launchOptions: {
      // Debian's Chromium: Playwright never downloads a browser here.
      executablePath: '/usr/bin/chromium',
      args: [
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
});
