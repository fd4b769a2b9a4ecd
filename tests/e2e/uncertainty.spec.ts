// The uncertainty panel: a default σ typed in the Analysis tab starts a Monte Carlo run in a
// Web Worker; the page stays responsive while it samples, and the result states N, seed and
// intervals. The demo is an invented scenario (assets/demo/demo.passline).
import { expect, test } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';
import { consoleErrors, dropFile, openEditor, pointRow } from './editorHelpers.ts';

const demo = JSON.parse(readFileSync(new URL('../../assets/demo/demo.passline', import.meta.url), 'utf8'));

test.afterEach(({ page }) => { expect(consoleErrors.get(page)).toEqual([]); });

test('a default σ gives intervals and TDTS odds, with N and the seed stated', async ({ page }) => {
  await openEditor(page);
  demo.settings.uncertainty = { samples: 2000, seed: 4 };
  await dropFile(page, JSON.stringify(demo), 'demo.passline');
  const panel = page.getByRole('region', { name: /How sure is this/ });
  await expect(panel.getByRole('status')).toContainText('No entered energy carries a σ');
  await panel.getByRole('textbox', { name: 'Default σ for entered energies' }).fill('1.5');
  await expect(panel.getByRole('status')).toContainText('N = 2000 samples, seed 4', { timeout: 20_000 });
  const thermal = panel.getByRole('table', { name: 'Uncertainty of Thermal' });
  // A typed TS with σ 1.5 kcal/mol over a reference that defines zero: median ≈ 31.8, interval ≈ ±1.96 × 1.5.
  const barrier = thermal.getByRole('row', { name: /Effective barrier/ });
  await expect(barrier.getByRole('cell').first()).toHaveText(/^3[12]\.\d$/);
  await expect(barrier.getByRole('cell').nth(1)).toHaveText(/^2[89]\.\d to 3[45]\.\d$/);
  await expect(panel.getByRole('table', { name: 'Uncertainty of LA cycle' }).getByRole('row', { name: /TDTS is/ })).toContainText('%');
});

test('sampling runs off the page: no long task while the worker samples', async ({ page }) => {
  await openEditor(page);
  demo.settings.uncertainty = { samples: 200000, seed: 1, defaultSigma: 1 };
  await page.evaluate(() => {
    (window as unknown as { longTasks: number[] }).longTasks = [];
    new PerformanceObserver((list) => { for (const e of list.getEntries()) (window as unknown as { longTasks: number[] }).longTasks.push(e.duration); }).observe({ type: 'longtask' });
  });
  await dropFile(page, JSON.stringify(demo), 'demo.passline');
  const panel = page.getByRole('region', { name: /How sure is this/ });
  await expect(panel.getByRole('status')).toContainText('Sampling', { timeout: 20_000 });
  // The run is in a dedicated worker, not in slices on the page.
  await expect.poll(() => page.workers().map((w) => w.url()).join(' ')).toMatch(/uncertaintyWorker/);
  await page.evaluate(() => { (window as unknown as { longTasks: number[] }).longTasks = []; });
  await page.waitForTimeout(1500);
  await expect(panel.getByRole('status')).toContainText('Sampling');
  const long = await page.evaluate(() => (window as unknown as { longTasks: number[] }).longTasks);
  // A frame is 16 ms; the renderer counts tasks over 50 ms as long. Allow short ones from a loaded machine, none over 250 ms.
  expect(long.filter((d) => d > 250)).toEqual([]);
});

test('error bars on the canvas follow the chosen kind and go away while a new run is pending', async ({ page }) => {
  await openEditor(page);
  demo.settings.uncertainty = { samples: 2000, seed: 4, defaultSigma: 1.5 };
  await dropFile(page, JSON.stringify(demo), 'demo.passline');
  const panel = page.getByRole('region', { name: /How sure is this/ });
  await expect(panel.getByRole('status')).toContainText('N = 2000 samples', { timeout: 20_000 });
  const bars = page.locator('[data-role="errorBar"]');
  await expect(bars).toHaveCount(0);
  await panel.getByRole('combobox', { name: 'Error bars on the figure' }).selectOption('interval');
  // Every level whose energy varies: all but the two reference states (AE, LA + AE) and LA·AE of the cycle.
  await expect(bars).not.toHaveCount(0);
  const count = await bars.count();
  // The mechanism table shows the same run's interval under each resolved energy (TS-th: 31.8 with σ 1.5 → about ±2.9).
  await expect(pointRow(page, 'Thermal', 1).getByRole('cell').nth(4)).toHaveText(/^31\.8\s*2[89]\.\d to 3[45]\.\d$/);
  await expect(pointRow(page, 'Thermal', 0).getByRole('cell').nth(4)).toHaveText('0.0');
  await expect(panel.getByRole('status')).toContainText('N = 2000 samples');
  await panel.getByRole('combobox', { name: 'Error bars on the figure' }).selectOption('sigma');
  await expect(bars).toHaveCount(count);
});

test('looks right at 1280 × 800', async ({ page }) => {
  await openEditor(page);
  await page.setViewportSize({ width: 1280, height: 800 });
  demo.settings.uncertainty = { samples: 2000, seed: 4, defaultSigma: 1.5 };
  demo.figure.errorBars = 'interval';
  await dropFile(page, JSON.stringify(demo), 'demo.passline');
  const panel = page.getByRole('region', { name: /How sure is this/ });
  await expect(panel.getByRole('status')).toContainText('N = 2000 samples', { timeout: 20_000 });
  await page.screenshot({ path: 'test-results/uncertainty-canvas.png' });
  await panel.scrollIntoViewIfNeeded();
  await page.screenshot({ path: 'test-results/uncertainty-panel.png' });
});

test('the analysis tables and the report exports carry the finished run, with N, seed and σ', async ({ page }) => {
  await openEditor(page);
  await page.setViewportSize({ width: 1280, height: 800 });
  demo.settings.uncertainty = { samples: 2000, seed: 4, defaultSigma: 1.5 };
  await dropFile(page, JSON.stringify(demo), 'demo.passline');
  const panel = page.getByRole('region', { name: /How sure is this/ });
  await expect(panel.getByRole('status')).toContainText('N = 2000 samples', { timeout: 20_000 });
  await page.getByRole('button', { name: 'Export…' }).click();
  const dialog = page.getByRole('dialog', { name: 'Export' });
  await dialog.getByRole('combobox', { name: 'What' }).selectOption('analysis-md');
  await expect(dialog).toContainText('With the Monte Carlo intervals: N = 2000 samples, seed 4');
  const preview = dialog.getByLabel('Preview');
  await expect(preview).toContainText('N = 2000 samples, seed 4', { timeout: 20_000 });
  await expect(preview).toContainText('1.5 kcal mol⁻¹ (default)');
  await expect(preview).toContainText('ΔG‡ forward, 97.5 % / kcal mol⁻¹');
  await page.screenshot({ path: 'test-results/uncertainty-export.png' });
  await dialog.getByRole('combobox', { name: 'What' }).selectOption('report');
  const download = page.waitForEvent('download');
  await dialog.getByRole('button', { name: 'Save export…' }).click();
  const pdf = await getDocument({ data: new Uint8Array(readFileSync(await (await download).path())), useSystemFonts: false, disableFontFace: true, verbosity: 0 }).promise;
  let text = '';
  for (let i = 1; i <= pdf.numPages; i++) text += (await (await pdf.getPage(i)).getTextContent()).items.map((t) => ('str' in t ? t.str : '')).join(' ');
  expect(text.replace(/\s+/g, ' ')).toContain('N = 2000 samples, seed 4');
  expect(text).toContain('Probabilities over the samples');
});
