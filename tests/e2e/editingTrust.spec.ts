// End-to-end checks that editing cannot silently change the document: undo always acts on
// the document's history, inputs that do not resolve stay marked, empty labels and absurd
// values are refused or flagged. Numbers are the demo's typed values (assets/demo).
import { expect, test, type Page } from '@playwright/test';
import { consoleErrors, dragBy, level, openEditor, pasteSpecies, pointRow } from './editorHelpers.ts';

const CAT = 'Catalysed (LA)';

test.beforeEach(async ({ page }) => { await openEditor(page); });
test.afterEach(({ page }) => { expect(consoleErrors.get(page)).toEqual([]); });

const field = (page: Page, pathway: string, name: string) =>
  page.getByRole('region', { name: `Pathway ${pathway}` }).getByRole('textbox', { name, exact: true });

test('Ctrl+Z after a drag undoes the drag even while a table field still has focus', async ({ page }) => {
  const product = field(page, CAT, 'LA + LC energy');
  await product.click();
  await product.press('Control+a');
  await product.pressSequentially('-40');
  await expect(pointRow(page, CAT, 7).getByRole('cell').nth(4)).toHaveText('−40.0');
  const ts2 = field(page, CAT, 'TS2 energy');
  await expect(ts2).toHaveValue('14.1');
  // The drag leaves the focus in the product's field, as a mouse on the canvas does.
  await dragBy(page, level(page, 'TS2', CAT), 0, -60);
  await expect(product).toBeFocused();
  expect(Number(await ts2.inputValue())).toBeGreaterThan(16);
  await page.keyboard.press('Control+z');
  // The drag is undone; the product keeps its typed −40 (the browser's text undo would have cleared it).
  await expect(ts2).toHaveValue('14.1');
  await expect(product).toHaveValue('-40');
  await page.keyboard.press('Control+z');
  await expect(product).toHaveValue('-9.6');
  await page.keyboard.press('Control+Shift+z');
  await expect(product).toHaveValue('-40');
});

/** Gives the Thermal route species sums: AE, TS-ab and LC in hartree, equal G corrections (invented values). */
async function thermalFromSpecies(page: Page): Promise<void> {
  await page.getByRole('tab', { name: /Species/ }).click();
  await pasteSpecies(page, 'id\tlabel\tE\tG correction\nae\tAE\t-100\t0.01\ntsab\tTS-ab\t-99.95\t0.01\nlc\tLC\t-100.01\t0.01\n');
  await expect(page.getByRole('tab', { name: 'Species (3)' })).toBeVisible();
  await page.getByRole('tab', { name: 'Mechanism' }).click();
  const thermal = page.getByRole('region', { name: 'Pathway Thermal' });
  for (const [label, id] of [['AE', 'ae'], ['TS-th', 'tsab'], ['LC', 'lc']] as const) {
    await thermal.getByRole('combobox', { name: `${label} energy given as`, exact: true }).selectOption({ label: 'species sum' });
    await field(page, 'Thermal', `${label} species`).fill(id);
  }
}

test('a species sum that does not resolve stays marked, the point shows it, and a finding names it', async ({ page }) => {
  await thermalFromSpecies(page);
  // TS-ab − AE = 0.05 Eh × 627.5095 kcal/mol per Eh (CODATA 2018 via REFERENCE.md §1) = 31.4 kcal/mol.
  const cell = pointRow(page, 'Thermal', 1).getByRole('cell').nth(4);
  await expect(cell).toHaveText('31.4');
  const sum = field(page, 'Thermal', 'TS-th species');
  await sum.fill('tsab + zz');
  await sum.press('Tab');
  // After leaving the field: the text stays, marked, with its message; no stale 31.4 anywhere.
  await expect(sum).toHaveValue('tsab + zz');
  await expect(sum).toHaveAttribute('aria-invalid', 'true');
  await expect(pointRow(page, 'Thermal', 1).getByRole('alert')).toHaveText(/no species with id "zz"/);
  await expect(cell).toHaveText('unresolved');
  await expect(page.locator('section.findings')).toContainText('the species sum of "TS-th" reads "tsab + zz", which does not resolve');
  await expect(page.getByLabel('Summary of Thermal', { exact: true })).not.toContainText('31.4');
  // A label typed where an id is expected is named as such.
  await sum.fill('TS-ab');
  await sum.press('Tab');
  await expect(pointRow(page, 'Thermal', 1).getByRole('alert')).toHaveText('"TS-ab" is a label; write the species id "tsab"');
  await expect(cell).toHaveText('unresolved');
  await sum.fill('tsab');
  await expect(cell).toHaveText('31.4');
  await expect(sum).toHaveAttribute('aria-invalid', 'false');
  await expect(page.getByText(/which does not resolve/)).toHaveCount(0);
});

test('an absurd energy is refused with its bound named; the figure keeps finite numbers', async ({ page }) => {
  const ts2 = field(page, CAT, 'TS2 energy');
  await ts2.fill('1e308');
  await ts2.press('Tab');
  // Hard bound of a relative energy: ±100 000 kJ/mol (core/model/bounds.ts, common practice).
  await expect(ts2).toHaveValue('1e308');
  await expect(ts2).toHaveAttribute('aria-invalid', 'true');
  await expect(pointRow(page, CAT, 4).getByRole('alert')).toContainText('is outside −100000 to 100000 kJ/mol');
  await expect(pointRow(page, CAT, 4).getByRole('cell').nth(4)).toHaveText('unresolved');
  await expect(page.locator('section.findings')).toContainText('the energy of "TS2" reads "1e308"');
  await expect(page.locator('body')).not.toContainText('Infinity');
  await expect(level(page, 'TS1', CAT)).toHaveAccessibleName(/ΔG = 16\.9 kcal mol⁻¹/);
  // A large barrier is refused the same way, whatever the unit it is typed in.
  const ts1 = field(page, CAT, 'TS1 energy');
  await ts1.fill('1000000');
  await expect(pointRow(page, CAT, 2).getByRole('alert')).toContainText('relative energy');
  await ts1.fill('21.1');
  await expect(ts1).toHaveAttribute('aria-invalid', 'false');
});

test('temperatures: 10⁶ K is refused, 5 K is taken with a warning that names the usual range', async ({ page }) => {
  const t = page.getByRole('textbox', { name: 'Temperature', exact: true });
  await t.fill('1000000');
  await t.press('Tab');
  await expect(t).toHaveAttribute('aria-invalid', 'true');
  await expect(page.getByText('temperature 1000000 K is outside 1 to 10000 K')).toBeVisible();
  await t.fill('5');
  await t.press('Tab');
  await expect(t).toHaveAttribute('aria-invalid', 'false');
  await expect(page.getByText('temperature 5 K is unusual (usually 100 to 2000 K)')).toBeVisible();
  await expect(page.getByRole('heading', { name: /Analysis/ })).toContainText('at 5 K');
});

test('an emptied label is flagged on its field and in the findings, and the level keeps a readable name', async ({ page }) => {
  const label = page.getByRole('region', { name: 'Pathway Thermal' }).getByRole('textbox', { name: 'Label, point 2' });
  await label.fill('');
  await label.press('Tab');
  await expect(label).toHaveAttribute('aria-invalid', 'true');
  await expect(pointRow(page, 'Thermal', 1).getByRole('alert')).toHaveText('a label is needed');
  await expect(page.locator('section.findings')).toContainText('point 2 of pathway "Thermal" has no label');
  await expect(page.getByRole('button', { name: /^unlabelled point 2 \(transition state, Thermal\)/ })).toHaveCount(1);
});

test('a fresh document shows no annotation error', async ({ page }) => {
  await page.getByRole('button', { name: 'New' }).click();
  await page.getByRole('tab', { name: 'Figure' }).click();
  await expect(page.getByText('needs two points for a barrier arrow')).toBeVisible();
  await expect(page.locator('.notes .problem')).toHaveCount(0);
});

test('Tab from the figure reaches the first level before any connector, and each step is one stop', async ({ page }) => {
  await page.getByRole('button', { name: 'Fit width' }).focus();
  await page.keyboard.press('Tab');
  await expect(page.locator(':focus')).toHaveAttribute('data-kind', 'level');
  const stops = await page.getByRole('button', { name: /^Step AE → TS-th → LC \(Thermal\)/ }).count();
  expect(stops).toBe(1);
});

test('New with unsaved changes asks for a second press in the status line under the toolbar, inside a 1280 × 800 view', async ({ page }) => {
  await page.setViewportSize({ width: 1280, height: 800 });
  const product = field(page, CAT, 'LA + LC energy');
  await product.fill('-40');
  await product.press('Tab');
  await expect(page.getByText('— unsaved changes')).toBeVisible();
  const toolbar = page.getByRole('toolbar', { name: 'File and edit' });
  await toolbar.getByRole('button', { name: 'New' }).click();
  const status = page.getByRole('status').filter({ hasText: 'press New again to discard' });
  await expect(status).toBeVisible();
  const box = (await status.boundingBox())!;
  const bar = (await toolbar.boundingBox())!;
  expect(box.x).toBeGreaterThanOrEqual(0);
  expect(box.y).toBeGreaterThanOrEqual(0);
  expect(box.x + box.width).toBeLessThanOrEqual(1280);
  expect(box.y + box.height).toBeLessThanOrEqual(800);
  // under the toolbar that caused it, not at the foot of the page
  expect(box.y).toBeGreaterThanOrEqual(bar.y + bar.height - 1);
  expect(box.y - (bar.y + bar.height)).toBeLessThan(60);
  await page.screenshot({ path: 'test-results/new-discard-status-1280.png' });
  // the first press discards nothing
  await expect(pointRow(page, CAT, 7).getByRole('cell').nth(4)).toHaveText('−40.0');
});
