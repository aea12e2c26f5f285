import { defineConfig } from '@playwright/test';

// The app is started by lib/tasks/test.sh (production build, test database, test ports);
// Playwright only drives Debian's Chromium against it.
const baseURL = process.env.E2E_BASE_URL ?? 'http://127.0.0.1:3100';

export default defineConfig({
  testDir: 'tests/e2e',
  outputDir: 'test-results/e2e',
  fullyParallel: false,
  workers: 1,
  retries: 0,
  timeout: 30_000,
  expect: { timeout: 7_000 },
  reporter: [['list'], ['json', { outputFile: 'test-results/reports/playwright.json' }]],
  use: {
    baseURL,
    screenshot: 'on',
    trace: 'retain-on-failure',
    launchOptions: {
      executablePath: '/usr/bin/chromium',
      args: [
        '--headless', '--no-sandbox', '--disable-gpu', '--disable-background-networking',
        '--disable-component-update', '--disable-sync', '--no-first-run',
        '--host-resolver-rules=MAP * ~NOTFOUND, EXCLUDE localhost, EXCLUDE 127.0.0.1',
      ],
    },
  },
  projects: [
    { name: 'setup', testMatch: /support\/.*\.setup\.ts$/ },
    // `outage` stops and restarts the database: a teardown, so it runs alone after every
    // e2e test, whatever their results.
    { name: 'e2e', testMatch: /\.spec\.ts$/, testIgnore: /outage\.spec\.ts$/, dependencies: ['setup'], teardown: 'outage' },
    { name: 'outage', testMatch: /outage\.spec\.ts$/ },
  ],
});
