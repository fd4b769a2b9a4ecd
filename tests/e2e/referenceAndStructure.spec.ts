// Two document settings made from the editor rather than the file: what energies are
// measured from (the reference), and a point's own structure drawn beside its level.
// The demo is the invented ring closure (assets/demo/demo.passline).
import { expect, test } from '@playwright/test';
import { consoleErrors, openEditor, pointRow } from './editorHelpers.ts';

test.afterEach(({ page }) => { expect(consoleErrors.get(page)).toEqual([]); });

test('measuring the demo from one of its points changes the energies in the table and on the figure', async ({ page }) => {
  await openEditor(page);
  await page.setViewportSize({ width: 1280, height: 800 });
  const figure = page.locator('section.canvas svg.scene');
  const thermalTs = pointRow(page, 'Thermal', 1).getByRole('cell').nth(4);
  // Typed in the demo: TS-th 31.8, INT (Catalysed) 2.3 kcal/mol; each pathway from its own first point.
  await expect(thermalTs).toHaveText('31.8');
  await expect(figure).toContainText('+31.8');
  const summary = page.getByRole('button', { name: /^Measured from/ });
  await expect(summary).toContainText('each pathway’s first point');

  await summary.click();
  const panel = page.getByRole('group', { name: 'What energies are measured from' });
  await panel.getByRole('radio', { name: /A point/ }).check();
  await panel.getByRole('combobox', { name: 'Reference point' }).selectOption(JSON.stringify(['catalysed', 'i2']));
  await expect(summary).toContainText('“INT” (Catalysed (LA))');
  await expect(panel).toContainText('Now: every pathway measured from "INT" (Catalysed (LA))');
  await page.screenshot({ path: 'test-results/reference-point.png' });
  // 31.8 − 2.3 = 29.5 kcal/mol, and the first points 0 − 2.3.
  await expect(thermalTs).toHaveText('29.5');
  await expect(pointRow(page, 'Thermal', 0).getByRole('cell').nth(4)).toHaveText('−2.3');
  await expect(figure).toContainText('+29.5');
  await expect(figure).not.toContainText('+31.8');
  await expect(page.locator('p[aria-label="Reference"]')).toContainText('every pathway measured from "INT" (Catalysed (LA))');
  await page.keyboard.press('Escape');
  await expect(panel).toBeHidden();
});

test('a SMILES typed for a point is drawn beside its level; one the toolkit cannot read is refused in place', async ({ page }) => {
  test.setTimeout(120_000);
  await openEditor(page);
  await page.setViewportSize({ width: 1280, height: 800 });
  const pathway = page.getByRole('region', { name: 'Pathway Catalysed (LA)' });
  await pathway.getByRole('button', { name: 'LA·AE structure' }).click();
  const entry = pathway.getByRole('group', { name: 'Structure of LA·AE' });
  const field = entry.getByRole('textbox', { name: 'Structure (SMILES, molfile or XYZ) of LA·AE' });
  await field.fill('O=C1CC(');
  await field.press('Enter');
  // The toolkit chunk is about 1 MB: on a busy machine it takes seconds to arrive and start.
  await expect(entry.getByRole('alert')).toContainText('Not read:', { timeout: 30_000 });
  await expect(field).toHaveValue('O=C1CC(');
  await expect(page.locator('section.canvas svg.scene [data-role="structure"]')).toHaveCount(0);

  // 2-pyrrolidinone, C4H7NO.
  await field.fill('O=C1CCCN1');
  await field.press('Enter');
  const drawn = page.locator('section.canvas svg.scene [data-role="structure"][data-pathway="catalysed"][data-point="c1"]');
  await expect(drawn.first()).toBeAttached({ timeout: 30_000 });
  await expect(entry.getByRole('img', { name: 'Drawing of C4H7NO' })).toBeVisible();
  await expect(entry.getByRole('alert')).toHaveCount(0);
  // Beside that level: the drawing's box is within a few level widths of the LA·AE bar.
  const bar = await page.getByRole('button', { name: /^LA·AE \(minimum, Catalysed \(LA\)\):/ }).boundingBox();
  const box = await drawn.first().boundingBox();
  expect(bar && box).toBeTruthy();
  expect(Math.abs((box!.x + box!.width / 2) - (bar!.x + bar!.width / 2))).toBeLessThan(3 * bar!.width);
  await page.screenshot({ path: 'test-results/point-structure.png' });
  // Drawn above by default; the row's side choice puts it below the bar.
  expect(box!.y + box!.height).toBeLessThanOrEqual(bar!.y + bar!.height / 2);
  await entry.locator('..').getByRole('combobox', { name: 'Side of the drawing of LA·AE' }).selectOption('below');
  await expect.poll(async () => (await drawn.first().boundingBox())!.y).toBeGreaterThan(bar!.y);
  await page.screenshot({ path: 'test-results/point-structure-below.png' });

  await entry.getByRole('button', { name: 'Remove the structure of LA·AE' }).click();
  await expect(page.locator('section.canvas svg.scene [data-role="structure"]')).toHaveCount(0);
});
