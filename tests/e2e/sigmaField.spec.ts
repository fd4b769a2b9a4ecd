// A σ typed beside a point's energy in the mechanism table reaches the uncertainty panel as
// an interval, and the σ fields fit the editor at 1280 × 800. The demo is an invented
// scenario (assets/demo/demo.passline).
import { expect, test } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { consoleErrors, dropFile, openEditor } from './editorHelpers.ts';

const demo = JSON.parse(readFileSync(new URL('../../assets/demo/demo.passline', import.meta.url), 'utf8'));

test.afterEach(({ page }) => { expect(consoleErrors.get(page)).toEqual([]); });

test('a σ typed beside a typed TS energy gives the effective barrier its 95 % interval', async ({ page }) => {
  await openEditor(page);
  await page.setViewportSize({ width: 1280, height: 800 });
  demo.settings.uncertainty = { samples: 2000, seed: 4 };
  await dropFile(page, JSON.stringify(demo), 'demo.passline');
  const panel = page.getByRole('region', { name: /How sure is this/ });
  await expect(panel.getByRole('status')).toContainText('No entered energy carries a σ');
  const sigma = page.getByRole('region', { name: 'Pathway Thermal' }).getByRole('textbox', { name: 'TS-th energy σ', exact: true });
  await expect(sigma).toHaveAttribute('placeholder', 'σ');
  await page.screenshot({ path: 'test-results/sigma-editor-1280.png' });
  await sigma.fill('-1');
  await expect(page.getByRole('region', { name: 'Pathway Thermal' }).getByRole('alert')).toContainText('σ: expected a standard uncertainty ≥ 0');
  await sigma.fill('1.5');
  await expect(panel.getByRole('status')).toContainText('N = 2000 samples, seed 4; 1 inputs with σ (0 from the default)', { timeout: 20_000 });
  // TS-th typed at 31.8 kcal/mol over the first state AE (the reference): median ≈ 31.8,
  // 95 % interval ≈ 31.8 ± 1.959964 × 1.5 = 28.9 to 34.7 (normal quantiles).
  const barrier = panel.getByRole('table', { name: 'Uncertainty of Thermal' }).getByRole('row', { name: /Effective barrier/ });
  await expect(barrier.getByRole('cell').first()).toHaveText(/^3[12]\.\d$/);
  await expect(barrier.getByRole('cell').nth(1)).toHaveText(/^2[89]\.\d to 3[45]\.\d$/);
  await sigma.scrollIntoViewIfNeeded();
  await page.screenshot({ path: 'test-results/sigma-typed-1280.png' });
  // The mechanism table does not scroll sideways at 1280 px with the σ fields in it.
  const table = page.getByRole('table', { name: 'Catalysed (LA)', exact: true });
  const overflow = await table.evaluate((t) => { const box = t.parentElement!; return box.scrollWidth - box.clientWidth; });
  expect(overflow).toBeLessThanOrEqual(1);
});
