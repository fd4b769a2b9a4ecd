import { defineConfig } from '@playwright/test';
import { existsSync } from 'node:fs';

// Debian's Chromium where it exists (CI, this workplace); otherwise Playwright's own
// Chromium, which tests/e2e/ensureBrowser.mjs downloads on a machine with internet.
const debianChromium = '/usr/bin/chromium';
const executablePath = existsSync(debianChromium) ? debianChromium : undefined;
// PASSLINE_E2E_PORT lets two checkouts on one machine run their e2e suites side by side.
const port = Number(process.env.PASSLINE_E2E_PORT ?? 4173);

export default defineConfig({
  testDir: 'tests/e2e',
  testMatch: '**/*.spec.ts',
  timeout: 30_000,
  workers: 2,
  reporter: [['list'], ['json', { outputFile: 'reports/playwright.json' }]],
  use: {
    browserName: 'chromium',
    baseURL: `http://127.0.0.1:${port}`,
    launchOptions: {
      executablePath,
      args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run',
        '--disable-background-networking', '--disable-component-update', '--disable-sync'],
    },
  },
  webServer: {
    command: `npx vite preview --host 127.0.0.1 --port ${port} --strictPort`,
    url: `http://127.0.0.1:${port}`,
    reuseExistingServer: false,
    timeout: 30_000,
  },
});
