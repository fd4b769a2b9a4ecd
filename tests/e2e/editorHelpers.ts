// Shared steps for the editor's end-to-end tests (browser host, built renderer).
import { expect, type Page } from '@playwright/test';

/** Console errors (CSP violations included) seen on a page; each test expects none. */
export const consoleErrors = new WeakMap<object, string[]>();

/** Opens the app with the download route of the browser host and waits for the canvas. */
export async function openEditor(page: Page): Promise<void> {
  const errors: string[] = [];
  consoleErrors.set(page, errors);
  page.on('console', (message) => { if (message.type() === 'error') errors.push(message.text()); });
  page.on('pageerror', (error) => errors.push(error.message));
  await page.addInitScript(() => { delete (window as { showSaveFilePicker?: unknown }).showSaveFilePicker; });
  await page.setViewportSize({ width: 1600, height: 1000 });
  await page.goto('/');
  await expect(page.getByRole('group', { name: 'Levels of the figure' })).toBeVisible();
}

/** The invisible, focusable hit target over a drawn level, found by the point's label and pathway. */
export function level(page: Page, label: string, pathway: string) {
  return page.getByRole('button', { name: new RegExp(`^${escape(label)} \\((minimum|transition state), ${escape(pathway)}\\):`) });
}

/** The mechanism table row of a point. */
export function pointRow(page: Page, pathway: string, index: number) {
  return page.getByRole('table', { name: pathway, exact: true }).getByRole('row').nth(index + 1);
}

/** Drags the pointer from the centre of a locator by (dx, dy) px in small moves. */
export async function dragBy(page: Page, target: ReturnType<Page['locator']>, dx: number, dy: number): Promise<void> {
  await target.scrollIntoViewIfNeeded();
  const box = await target.boundingBox();
  if (!box) throw new Error('nothing to drag');
  const x = box.x + box.width / 2, y = box.y + box.height / 2;
  await page.mouse.move(x, y);
  await page.mouse.down();
  await page.mouse.move(x + dx, y + dy, { steps: 12 });
  await page.mouse.up();
}

/** Vertical page centre (px) of a locator. */
export async function centreY(target: ReturnType<Page['locator']>): Promise<number> {
  const box = await target.boundingBox();
  if (!box) throw new Error('not on screen');
  return box.y + box.height / 2;
}

/** Drops a file with the given text on the window, as a user drags one from the desktop. */
export async function dropFile(page: Page, text: string, name: string): Promise<void> {
  await page.evaluate(([t, n]) => {
    const data = new DataTransfer();
    data.items.add(new File([t!], n!, { type: 'application/json' }));
    window.dispatchEvent(new DragEvent('drop', { dataTransfer: data, bubbles: true, cancelable: true }));
  }, [text, name]);
}

/** Pastes a tab-separated block into the species sheet's paste field (the Species tab must be open). */
export async function pasteSpecies(page: Page, text: string): Promise<void> {
  await page.getByRole('textbox', { name: 'Paste a block as new species' }).evaluate((el, t) => {
    const data = new DataTransfer();
    data.setData('text/plain', t);
    el.dispatchEvent(new ClipboardEvent('paste', { clipboardData: data, bubbles: true, cancelable: true }));
  }, text);
}

function escape(text: string): string {
  return text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
}
