import { defineConfig } from '@playwright/test';

// The desktop (Electron) end-to-end suite, kept apart from the browser suite in
// playwright.config.ts. It drives the built app (npm run build) and skips, saying why,
// where no Electron binary or display is available.
export default defineConfig({
  testDir: 'tests/e2e-electron',
  testMatch: '**/*.spec.ts',
  timeout: 60_000,
  workers: 1,
  reporter: [['list'], ['json', { outputFile: 'reports/playwright-electron.json' }]],
  outputDir: 'test-results/electron',
});
