// End-to-end check of the app shell in a plain browser (the browser host): the bundled
// demo is shown, a malformed file is refused without losing the document, and saving
// downloads text that loads as the same document.
import { expect, test } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { parseDocument } from '../../core/model/load.ts';
import type { Document } from '../../core/model/schema.ts';
import { unitLabel } from '../../core/units/energy.ts';

const demoText = readFileSync(new URL('../../assets/demo/demo.passline', import.meta.url), 'utf8');

function demoDocument(): Document {
  const result = parseDocument(demoText);
  if (!result.ok) throw new Error(`the demo does not load: ${JSON.stringify(result.errors)}`);
  return result.doc;
}

/**
 * Points whose shown energy follows from the file alone: typed values in the display unit
 * on a pathway whose first point is typed as 0, so relative = typed (no arithmetic of ours).
 */
function typedExpectations(doc: Document) {
  const rows: { pathway: string; label: string; shown: string }[] = [];
  for (const pathway of doc.pathways) {
    const first = pathway.points[0]?.energy;
    if (doc.settings.reference.kind !== 'first' || first?.mode !== 'value' || first.value !== 0) continue;
    for (const point of pathway.points) {
      if (point.energy.mode === 'value' && point.energy.unit === doc.settings.unit && point.energy.quantity === undefined) {
        rows.push({ pathway: pathway.name, label: point.label, shown: point.energy.value.toFixed(doc.settings.decimals).replace('-', '−') });
      }
    }
  }
  return rows;
}

// Console errors include Content-Security-Policy violations: the strict policy must hold.
const consoleErrors = new WeakMap<object, string[]>();

test.beforeEach(async ({ page }) => {
  const errors: string[] = [];
  consoleErrors.set(page, errors);
  page.on('console', (message) => { if (message.type() === 'error') errors.push(message.text()); });
  page.on('pageerror', (error) => errors.push(error.message));
  // Force the download route of the browser host: a native save picker cannot be driven headless.
  await page.addInitScript(() => {
    delete (window as { showSaveFilePicker?: unknown }).showSaveFilePicker;
  });
  await page.goto('/');
});

test.afterEach(({ page }) => {
  expect(consoleErrors.get(page)).toEqual([]);
});

test('shows the demo pathways with their energies and unit', async ({ page }) => {
  const doc = demoDocument();
  await expect(page.getByRole('heading', { level: 1 })).toHaveText(doc.title);
  const heading = `Δ${doc.settings.quantity} / ${unitLabel(doc.settings.unit)}`;
  for (const pathway of doc.pathways) {
    const table = page.getByRole('table', { name: pathway.name, exact: true });
    await expect(table).toBeVisible();
    await expect(table.getByRole('columnheader', { name: heading })).toBeVisible();
    await expect(table.getByRole('rowheader')).toHaveCount(pathway.points.length);
  }
  const expectations = typedExpectations(doc);
  expect(expectations.length).toBeGreaterThan(1);
  for (const { pathway, label, shown } of expectations) {
    const row = page.getByRole('table', { name: pathway, exact: true }).getByRole('row')
      .filter({ has: page.getByRole('rowheader', { name: label, exact: true }) });
    // Cells of a mechanism row: number, kind, energy mode, energy input, resolved energy, actions.
    await expect(row.getByRole('cell').nth(4)).toHaveText(shown);
  }
});

test('a malformed file shows its errors and leaves the demo in place', async ({ page }) => {
  const doc = demoDocument();
  const broken = JSON.parse(demoText);
  broken.title = 'Should never appear';
  broken.pathways[0].points[1].energy.value = 'abc';
  const chooser = page.waitForEvent('filechooser');
  await page.getByRole('button', { name: 'Open…' }).click();
  await (await chooser).setFiles({ name: 'broken.passline', mimeType: 'application/json', buffer: Buffer.from(JSON.stringify(broken)) });

  const alert = page.getByRole('alert');
  await expect(alert).toContainText('broken.passline could not be opened');
  await expect(alert).toContainText('pathways[0].points[1].energy.value');
  await expect(alert).toContainText('expected a number in kcal/mol, got "abc"');
  await expect(page.getByRole('heading', { level: 1 })).toHaveText(doc.title);
  await expect(page.getByRole('table', { name: doc.pathways[0]!.name, exact: true })).toBeVisible();
  await expect(page.getByRole('status', { name: 'Document status' })).toContainText('broken.passline was not opened');
});

test('save as downloads text that loads as the same document', async ({ page }) => {
  const download = page.waitForEvent('download');
  await page.getByRole('button', { name: 'Save as…' }).click();
  const file = await download;
  expect(file.suggestedFilename()).toBe('demo.passline');
  const saved = parseDocument(readFileSync(await file.path(), 'utf8'));
  expect(saved.ok && saved.doc).toEqual(demoDocument());
  await expect(page.getByRole('status', { name: 'Document status' })).toHaveText('Saved demo.passline.');
});

test('a valid file opened replaces the document', async ({ page }) => {
  // Written as an older format-2 file (no reference setting yet): opening it says it was migrated.
  const other = { ...JSON.parse(demoText), version: 2, title: 'Second scenario (invented)' };
  delete other.settings.reference;
  other.pathways[0].name = 'Renamed route';
  const chooser = page.waitForEvent('filechooser');
  await page.getByRole('button', { name: 'Open…' }).click();
  await (await chooser).setFiles({ name: 'second.passline', mimeType: 'application/json', buffer: Buffer.from(JSON.stringify(other)) });
  await expect(page.getByRole('heading', { level: 1 })).toHaveText('Second scenario (invented)');
  await expect(page.getByRole('table', { name: 'Renamed route', exact: true })).toBeVisible();
  await expect(page.getByRole('status', { name: 'Document status' })).toHaveText('Opened second.passline (updated from format version 2; saving writes the new version).');
});

test('the built page carries the strict Content-Security-Policy', async ({ page }) => {
  const csp = await page.locator('meta[http-equiv="Content-Security-Policy"]').getAttribute('content');
  expect(csp).toContain("script-src 'self';");
  expect(csp).toMatch(/style-src 'self'\s*;/);
  expect(csp).not.toContain('unsafe');
});
