// A crowded document (10 pathways × 50 points, invented zig-zag energies): labels that find
// no room are named and can be drawn by hand, and a level dragged while the figure is too
// big to re-lay out on every move still lands on the energy it was dropped at.
import { expect, test, type Page } from '@playwright/test';
import { crowdedDocumentText } from '../fixtures/crowdedDocument.ts';
import { consoleErrors, dropFile, level, openEditor } from './editorHelpers.ts';

const crowded = crowdedDocumentText((p) => `route ${p + 1}`);

async function dropDocument(page: Page, text: string): Promise<void> {
  await dropFile(page, text, 'crowded.passline');
  await expect(page.locator('svg.overlay rect.hit')).toHaveCount(500);
}

test.beforeEach(async ({ page }) => { await openEditor(page); await dropDocument(page, crowded); });
test.afterEach(({ page }) => { expect(consoleErrors.get(page)).toEqual([]); });

test('labels left out for want of room are named, and a selected one is drawn by hand', async ({ page }) => {
  const note = page.getByRole('status').filter({ hasText: 'found no clear spot inside the figure' });
  await expect(note).toBeVisible();
  const count = Number((await note.textContent())!.match(/^(\d+) labels/)![1]);
  expect(count).toBeGreaterThan(0);
  // The sentence names the first one left out: "TS1" (route N).
  const [, label, route] = (await note.textContent())!.match(/left out: "([^"]+)" \(([^)]+)\)/)!;
  // Levels overlap in so crowded a figure, so it is picked with the keyboard.
  await level(page, label!, route!).focus();
  await page.keyboard.press('Enter');
  await page.getByRole('button', { name: `Draw the label “${label}” at its level` }).click();
  const drawn = page.locator(`svg.overlay rect.label-hit[data-pathway="p${Number(route!.split(' ')[1]) - 1}"][data-point="p${Number(route!.split(' ')[1]) - 1}-${label!.replace(/\D/g, '')}"]`);
  await expect(drawn).toHaveCount(1);
  await expect(note).not.toHaveText(new RegExp(`^${count} labels`));
});

test('a level dragged in a crowded figure takes the energy it is dropped at, as one undo step', async ({ page }) => {
  // Long documents open with the first pathway's points shown; route 10 is drawn on top.
  const route = page.getByRole('region', { name: 'Pathway route 10' });
  await route.getByRole('button', { name: 'Show 50 points' }).click();
  const field = route.getByRole('textbox', { name: 'I24 energy', exact: true });
  const before = Number(await field.inputValue());
  const target = level(page, 'I24', 'route 10');
  await target.scrollIntoViewIfNeeded();
  const box = (await target.boundingBox())!;
  const x = box.x + box.width / 2, y = box.y + box.height / 2;
  // A full re-layout of 500 points is over the live budget: the level moves on its own layer
  // ahead of the document, and the document catches up when the pointer rests or lets go.
  const sawLayer = page.evaluate(() => new Promise<boolean>((resolve) => {
    const seen = () => document.querySelector('section.canvas .drag-layer') !== null;
    const watch = new MutationObserver(() => { if (seen()) { watch.disconnect(); resolve(true); } });
    watch.observe(document.body, { childList: true, subtree: true });
    setTimeout(() => { watch.disconnect(); resolve(seen()); }, 10_000);
  }));
  await page.mouse.move(x, y);
  await page.mouse.down();
  await page.mouse.move(x, y - 15, { steps: 6 });
  await page.mouse.move(x, y - 30, { steps: 6 });
  expect(await sawLayer).toBe(true);
  await page.mouse.up();
  await expect(page.locator('section.canvas .drag-layer')).toHaveCount(0);
  await expect.poll(async () => Number(await field.inputValue())).toBeGreaterThan(before + 1);
  await page.getByRole('button', { name: 'Undo' }).click();
  await expect(field).toHaveValue(String(before));
});
