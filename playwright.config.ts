import { defineConfig } from '@playwright/test';
import { existsSync } from 'node:fs';

// Debian's Chromium where it exists (CI, this workplace); otherwise Playwright's own
// Chromium, which tests/e2e/ensureBrowser.mjs downloads on a machine with internet.
const debianChromium = '/usr/bin/chromium';
const executablePath = existsSync(debianChromium) ? debianChromium : undefined;

export default defineConfig({
  testDir: 'tests/e2e',
  testMatch: '**/*.spec.ts',
  timeout: 30_000,
  workers: 2,
  reporter: [['list'], ['json', { outputFile: 'reports/playwright.json' }]],
  use: {
    browserName: 'chromium',
    baseURL: 'http://127.0.0.1:4173',
    launchOptions: {
      executablePath,
      args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run',
        '--disable-background-networking', '--disable-component-update', '--disable-sync'],
    },
  },
  webServer: {
    command: 'npx vite preview --host 127.0.0.1 --port 4173 --strictPort',
    url: 'http://127.0.0.1:4173',
    reuseExistingServer: false,
    timeout: 30_000,
  },
});
