// The editor on laptop and desktop screens: every primary control is reachable without
// horizontal scrolling, and the figure stays in view while lower pathways are edited.
import { expect, test, type Page } from '@playwright/test';
import { consoleErrors, openEditor, pasteSpecies } from './editorHelpers.ts';

test.afterEach(({ page }) => { expect(consoleErrors.get(page)).toEqual([]); });

/** Elements that scroll sideways (their content is wider than they are). */
const sidewaysScrollers = (page: Page) => page.evaluate(() => [...document.querySelectorAll('*')]
  .filter((e) => e.scrollWidth > e.clientWidth + 1 && !['visible', 'hidden', 'clip'].includes(getComputedStyle(e).overflowX))
  .map((e) => `${e.tagName.toLowerCase()}.${(e.getAttribute('class') ?? '').split(' ')[0]} ${e.scrollWidth} > ${e.clientWidth}`));

for (const [width, height] of [[1280, 800], [1920, 1080]] as const) {
  test(`at ${width} × ${height} nothing scrolls sideways and the figure stays in view`, async ({ page }) => {
    await openEditor(page);
    await page.setViewportSize({ width, height });
    // The figure re-fits its width after a resize on the next frames: wait for the layout to settle.
    await expect.poll(() => sidewaysScrollers(page), { timeout: 15_000 }).toEqual([]);
    // The document settings sit on one row (the axis note gives way below 1400 px; the figure's axis says it).
    const middles = await page.getByRole('group', { name: 'Document settings' }).evaluate((bar) => [...bar.children]
      .map((c) => c.getBoundingClientRect()).filter((r) => r.width > 0).map((r) => r.top + r.height / 2));
    expect(Math.max(...middles) - Math.min(...middles)).toBeLessThan(6);
    const figure = page.getByRole('group', { name: 'Levels of the figure' });
    // The last point of the last pathway: its actions are inside the window, the figure still shown.
    const last = page.getByRole('region', { name: 'Pathway LA cycle' }).getByRole('button', { name: /^Delete / }).last();
    await last.scrollIntoViewIfNeeded();
    const box = (await last.boundingBox())!;
    expect(box.x + box.width).toBeLessThanOrEqual(width);
    await expect(figure).toBeInViewport({ ratio: 0.6 });
    await page.screenshot({ path: `test-results/layout-${width}x${height}.png` });
    // The species sheet and the results pane do not scroll sideways either.
    await page.getByRole('tab', { name: /Species/ }).click();
    await pasteSpecies(page, 'id\tlabel\tE\tG correction\nla\tLA\t-1205.512\t0.0412\nae\tAE\t-441.207\t0.1533\n');
    await expect(page.getByRole('tab', { name: 'Species (2)' })).toBeVisible();
    await page.getByRole('button', { name: /^Conformers of LA/ }).click();
    await expect(page.getByRole('textbox', { name: 'E, conformer 1 of LA' })).toBeVisible();
    await expect.poll(() => sidewaysScrollers(page), { timeout: 15_000 }).toEqual([]);
    await page.screenshot({ path: `test-results/layout-species-${width}x${height}.png` });
  });
}

test('the splitter gives the editor more or less of the width, from the keyboard too', async ({ page }) => {
  await openEditor(page);
  await page.setViewportSize({ width: 1280, height: 800 });
  const splitter = page.getByRole('separator', { name: 'Width of the editor beside the figure' });
  const figure = page.getByRole('region', { name: 'Figure' });
  const before = (await figure.boundingBox())!.width;
  await splitter.focus();
  for (let i = 0; i < 5; i++) await page.keyboard.press('ArrowRight');
  await expect(splitter).toHaveAttribute('aria-valuenow', '62');
  expect((await figure.boundingBox())!.width).toBeLessThan(before - 80);
});
