// Output files dropped on the species sheet: review first, then species and a pathway in one step.
// Fixtures are excerpts of cclib's regression outputs (tests/fixtures/qc/SOURCES.md).
import { expect, test } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { consoleErrors, openEditor } from './editorHelpers.ts';

const fixture = (name: string) => readFileSync(new URL(`../fixtures/qc/${name}`, import.meta.url), 'utf8');

test.beforeEach(async ({ page }) => { await openEditor(page); });
test.afterEach(({ page }) => { expect(consoleErrors.get(page)).toEqual([]); });

test('dropping a Gaussian and an ORCA output shows the review, then adds both species and a pathway', async ({ page }) => {
  await page.getByRole('tab', { name: /Species/ }).click();
  const before = await page.getByRole('tab', { name: /Species/ }).textContent();
  await page.getByRole('region', { name: 'Species' }).evaluate((el, files) => {
    const data = new DataTransfer();
    for (const [name, text] of files) data.items.add(new File([text!], name!));
    el.dispatchEvent(new DragEvent('drop', { dataTransfer: data, bubbles: true, cancelable: true }));
  }, [['dvb_g16.log', fixture('g16-dvb-freq.log')], ['dvb_orca6.out', fixture('orca6-dvb-freq.out')]]);
  const review = page.getByRole('table', { name: 'Species read from output files' });
  await expect(review.getByRole('row')).toHaveCount(3);
  await expect(review.getByRole('row').nth(1)).toContainText('Gaussian 16 A.03');
  await expect(review.getByRole('row').nth(2)).toContainText('ORCA 6.0.1');
  // The document is unchanged until "Add".
  await expect(page.getByRole('tab', { name: /Species/ })).toHaveText(before!);
  await page.setViewportSize({ width: 1280, height: 800 });
  await page.screenshot({ path: 'test-results/calc-review.png' });
  await page.getByRole('checkbox', { name: /also add a pathway/ }).check();
  await page.getByRole('button', { name: 'Add 2 species' }).click();
  await expect(review).toHaveCount(0);
  await expect(page.getByText('Added 2 species from output files and the pathway “From output files”.')).toBeVisible();
  await page.getByRole('tab', { name: /Mechanism|Pathways|Editor/ }).first().click();
  await expect(page.getByRole('table', { name: 'From output files', exact: true })).toBeVisible();
});
