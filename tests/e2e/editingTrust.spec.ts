// End-to-end checks that editing cannot silently change the document: undo always acts on
// the document's history, inputs that do not resolve stay marked, empty labels and absurd
// values are refused or flagged. Numbers are the demo's typed values (assets/demo).
import { expect, test, type Page } from '@playwright/test';
import { consoleErrors, dragBy, level, openEditor, pointRow } from './editorHelpers.ts';

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
