// Structures in the editor: the toolkit chunk is fetched only once a document has a
// structure; the figure then draws each point's molecule, and the species sheet shows a
// thumbnail with a larger preview on hover. The document is the invented ester hydrolysis.
import { expect, test } from '@playwright/test';
import { serializeDocument } from '../../core/model/load.ts';
import { structuresDocument } from '../fixtures/structuresDocument.ts';
import { consoleErrors, dropFile, openEditor } from './editorHelpers.ts';

test.afterEach(({ page }) => { expect(consoleErrors.get(page)).toEqual([]); });

test('the toolkit loads on demand, and the figure and species sheet show the structures', async ({ page }) => {
  test.setTimeout(120_000);
  const requested: string[] = [];
  page.on('request', (r) => requested.push(r.url()));
  await openEditor(page);
  expect(requested.filter((u) => /openchemlib/.test(u))).toEqual([]);

  await dropFile(page, serializeDocument(structuresDocument()), 'ester.passline');
  // The toolkit chunk is about 1 MB: on a busy machine it takes seconds to arrive and start.
  await expect(page.locator('svg [data-role="structure"]').first()).toBeAttached({ timeout: 30_000 });
  expect(requested.some((u) => /openchemlib/.test(u))).toBe(true);
  const groups = await page.locator('svg [data-role="structure"]').evaluateAll((els) => new Set(els.map((e) => e.getAttribute('data-point'))).size);
  expect(groups).toBe(6);
  await page.setViewportSize({ width: 1280, height: 800 });
  await page.screenshot({ path: 'test-results/structures-figure.png' });

  await page.getByRole('tab', { name: /Species/ }).click();
  const cell = page.getByRole('group', { name: 'Structure of methyl acetate' });
  const thumb = cell.getByRole('img', { name: 'Drawing of C3H6O2' });
  await expect(thumb.locator('svg')).toBeVisible();
  await thumb.hover();
  await expect(cell.getByRole('tooltip')).toContainText('C3H6O2');
  await page.screenshot({ path: 'test-results/structures-sheet.png' });

  await page.getByRole('button', { name: 'Add species' }).click();
  const input = page.getByRole('textbox', { name: /^Structure \(SMILES, molfile or XYZ\) of / }).last();
  await input.fill('c1ccncc1');
  await input.press('Enter');
  await expect(page.getByRole('img', { name: 'Drawing of C5H5N' })).toBeVisible();
});
