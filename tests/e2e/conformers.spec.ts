// Conformers typed in the species sheet reach the profile: a second TS1 conformer lower in
// G lowers TS1 in the mechanism table by the Boltzmann ensemble. Expected numbers are
// worked by hand below from the demo's absolute energies (an invented scenario).
import { expect, test } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { consoleErrors, dropFile, openEditor, pointRow } from './editorHelpers.ts';

const demoText = readFileSync(new URL('../../assets/demo/species-demo.passline', import.meta.url), 'utf8');

test.beforeEach(async ({ page }) => {
  await openEditor(page);
  await dropFile(page, demoText, 'species-demo.passline');
  await expect(page.getByRole('tab', { name: 'Species (6)' })).toBeVisible();
});
test.afterEach(({ page }) => { expect(consoleErrors.get(page)).toEqual([]); });

test('a TS1 conformer added with a lower G correction lowers TS1 in the mechanism table', async ({ page }) => {
  // TS1 over Q + S, G at 298.15 K, 1 atm → 1 M for each solute: +RT ln(RTc°/p°) =
  // 1.89432844549 kcal/mol (REFERENCE.md §5; Kelly, Cramer & Truhlar, J. Phys. Chem. B 110,
  // 16066 (2006)); 1 Eh = 627.5094740630558 kcal/mol (CODATA 2018, REFERENCE.md §1):
  // G(TS1) − G(Q) − G(S) = (−596.83867 + 596.88051) Eh = 0.04184 Eh = 26.25500 kcal/mol,
  // minus one standard-state term (two on the left, one on the right): 24.36067 → "24.4".
  const ts1 = pointRow(page, 'Q-catalysed', 2).getByRole('cell').nth(4);
  await expect(ts1).toHaveText('24.4');

  await page.getByRole('tab', { name: /Species/ }).click();
  const disclosure = page.getByRole('button', { name: 'Conformers of TS1 (1)' });
  await disclosure.click();
  await expect(disclosure).toHaveAttribute('aria-expanded', 'true');
  const table = page.getByRole('table', { name: 'Conformers of TS1' });
  await page.getByRole('button', { name: 'Add conformer to TS1' }).click();
  await table.getByRole('textbox', { name: 'G correction, conformer 2 of TS1' }).fill('0.25764');

  // The new conformer is 0.00159 Eh = 0.997740 kcal/mol lower; RT = 0.592484950 kcal/mol
  // (R = 8.31446261815324 J/(mol K), CODATA 2018). Its share 1/(1 + e^(−0.997740/RT)) =
  // 0.84343 → 84.3 %, and G_eff = G₂ − RT ln(1 + e^(−0.997740/RT)) = G₁ − 1.098626 kcal/mol
  // (Boltzmann ensemble, REFERENCE.md §8), so TS1 = 24.36067 − 1.09863 = 23.26204 → "23.3".
  await expect(table.getByLabel(/^Population of conformer 2 of TS1/)).toHaveText('84.3');
  await expect(table.getByLabel(/^Population of conformer 1 of TS1/)).toHaveText('15.7');
  await expect(page.getByRole('button', { name: 'Conformers of TS1 (2)' })).toBeVisible();
  await page.getByRole('tab', { name: 'Mechanism' }).click();
  await expect(ts1).toHaveText('23.3');
});

test('a conformer σ gives each population its 95 % interval, sampled off the page', async ({ page }) => {
  await page.setViewportSize({ width: 1280, height: 800 });
  await page.getByRole('tab', { name: /Species/ }).click();
  await page.getByRole('button', { name: 'Conformers of TS1 (1)' }).click();
  const table = page.getByRole('table', { name: 'Conformers of TS1' });
  await page.getByRole('button', { name: 'Add conformer to TS1' }).click();
  await table.getByRole('textbox', { name: 'G correction, conformer 2 of TS1' }).fill('0.25764');
  // σ of 0.0016 Eh (about 1 kcal/mol) on conformer 2's electronic energy: the share 84.3 % of the
  // previous test now spreads; its ends are the logistic of the gap ± 1.959964 σ (normal quantiles).
  const sigmaColumns = page.getByRole('checkbox', { name: 'σ (standard uncertainty)' });
  if (!(await sigmaColumns.isChecked())) await sigmaColumns.check();
  await table.getByRole('textbox', { name: /^σ.*conformer 2 of TS1$/ }).first().fill('0.0016');
  await expect(page.getByText(/In brackets: 95 % interval .* N = \d+ Monte Carlo samples, seed \d+, from 1 conformer σ/)).toBeVisible({ timeout: 20_000 });
  await expect(table.getByLabel(/^Population of conformer 2 of TS1/)).toHaveText(/^84\.3 \(\d+\.\d to \d+\.\d\)$/);
  await table.getByLabel(/^Population of conformer 2 of TS1/).scrollIntoViewIfNeeded();
  await page.screenshot({ path: 'test-results/conformer-intervals.png' });
});
