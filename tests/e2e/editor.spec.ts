// End-to-end checks of the editor in a plain browser: typing and dragging energies, the
// species sheet, undo/redo, settings, findings, export and a refused file. Expected
// numbers come from the demo's typed values with the arithmetic spelt out beside them.
import { expect, test } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';
import { centreY, consoleErrors, dragBy, dropFile, level, openEditor, pasteSpecies, pointRow } from './editorHelpers.ts';

const demoText = readFileSync(new URL('../../assets/demo/demo.passline', import.meta.url), 'utf8');
const CAT = 'Catalysed (LA)';

test.beforeEach(async ({ page }) => { await openEditor(page); });
test.afterEach(({ page }) => { expect(consoleErrors.get(page)).toEqual([]); });

/** The first value of a pathway's analysis summary: its effective barrier. */
const summary = (page: import('@playwright/test').Page, name: string) => page.getByLabel(`Summary of ${name}`, { exact: true }).locator('dd').first();

test('the demo opens with its figure, mechanism and analysis', async ({ page }) => {
  await expect(page.getByRole('table', { name: 'Thermal', exact: true })).toBeVisible();
  // Thermal route: TS-th typed 31.8 over AE typed 0, so the effective barrier (largest
  // T_j − I_i, Kozuch & Shaik, Acc. Chem. Res. 44, 101 (2011)) is 31.8 kcal/mol.
  await expect(summary(page, 'Thermal')).toHaveText(/^31\.8 kcal mol⁻¹/);
  await expect(level(page, 'TS-th', 'Thermal')).toHaveAccessibleName(/ΔG = 31\.8 kcal mol⁻¹/);
});

test('typing a barrier re-resolves the point and updates the analysis', async ({ page }) => {
  // Catalysed route: LA·AE is a step of −4.2 from 0; TS1 a barrier of 21.1 over it. Typing
  // 25 puts TS1 at −4.2 + 25 = 20.8 and the effective barrier at 20.8 − (−4.2) = 25.0
  // (TS2: 14.1 + 4.2 = 18.3 and TS3: −2.5 + 14.0 = 11.5 are lower).
  await expect(summary(page, CAT)).toHaveText(/^21\.1 kcal mol⁻¹/);
  await page.getByRole('region', { name: `Pathway ${CAT}` }).getByRole('textbox', { name: 'TS1 energy', exact: true }).fill('25');
  await expect(pointRow(page, CAT, 2).getByRole('cell').nth(4)).toHaveText('20.8');
  await expect(summary(page, CAT)).toHaveText(/^25\.0 kcal mol⁻¹ \(TS1 over LA·AE\)/);
  // ΔΔG‡ between the routes: 31.8 − 25.0 = 6.8 kcal/mol.
  await expect(page.getByRole('list', { name: 'Comparisons' })).toContainText('ΔΔG‡ = 6.8 kcal mol⁻¹');
});

test('dragging a level up raises its typed energy live, and one undo restores it', async ({ page }) => {
  const field = page.getByRole('region', { name: `Pathway ${CAT}` }).getByRole('textbox', { name: 'TS2 energy', exact: true });
  await expect(field).toHaveValue('14.1');
  await dragBy(page, level(page, 'TS2', CAT), 0, -60);
  const raised = Number(await field.inputValue());
  expect(raised).toBeGreaterThan(16);
  // The TS2 span over LA·AE (−4.2) is now the catalysed effective barrier once above TS1's 21.1.
  await expect(level(page, 'TS2', CAT)).toHaveAccessibleName(new RegExp(`ΔG = ${raised.toFixed(1)} kcal`));
  await page.keyboard.press('Control+z');
  await expect(field).toHaveValue('14.1');
  await page.getByRole('button', { name: 'Redo' }).click();
  await expect(field).toHaveValue(String(raised));
});

test('a label dragged by hand stays where it was put; a level dragged sideways moves in x', async ({ page }) => {
  const label = page.locator('svg.overlay rect.label-hit[data-pathway="catalysed"][data-point="i2"]');
  const before = await label.boundingBox();
  await dragBy(page, label, 30, 20);
  const after = await label.boundingBox();
  expect(after!.x - before!.x).toBeGreaterThan(20);
  expect(after!.y - before!.y).toBeGreaterThan(12);
  const int = level(page, 'INT', CAT);
  const x0 = (await int.boundingBox())!.x;
  await dragBy(page, int, 40, 0);
  // The bar follows the pointer to the nearest 0.05 slot; neighbours re-space around it.
  expect((await int.boundingBox())!.x - x0).toBeGreaterThan(15);
  // Sideways moves change spacing, never the energy.
  await expect(int).toHaveAccessibleName(/ΔG = 2\.3 kcal mol⁻¹/);
});

test('clicking a connector describes its step; Enter on the focused connector clears it again', async ({ page }) => {
  // Thermal route of the demo: AE 0, TS-th +31.8, LC −9.6 kcal/mol (typed), so the step has
  // ΔG‡ +31.8 forward, 31.8 + 9.6 = +41.4 back and ΔrG −9.6.
  const connector = page.getByRole('button', { name: /^Step AE → TS-th → LC \(Thermal\)/ }).first();
  await expect(connector).toHaveAccessibleName(/ΔG‡ \+31\.8 kcal mol⁻¹ forward, \+41\.4 kcal mol⁻¹ back; ΔrG −9\.6 kcal mol⁻¹; k forward .+ s⁻¹$/);
  const box = (await connector.boundingBox())!;
  // The connector rises from AE to TS-th: a point a fifth of the way along it.
  await page.mouse.click(box.x + 0.2 * box.width, box.y + 0.8 * box.height);
  const described = page.locator('section.canvas p.step');
  await expect(described).toHaveText(/^Step AE → TS-th → LC \(Thermal\): ΔG‡ \+31\.8 kcal mol⁻¹ forward/);
  await expect(connector).toHaveAttribute('aria-pressed', 'true');
  await connector.focus();
  await page.keyboard.press('Enter');
  await expect(described).toHaveCount(0);
});

test('keyboard only: Tab reaches a level and the arrow keys nudge it by the shown decimal', async ({ page }) => {
  const ts1 = level(page, 'TS1', CAT);
  await ts1.focus();
  await page.keyboard.press('ArrowUp');
  await page.keyboard.press('Shift+ArrowUp');
  // TS1 is a barrier of 21.1 over LA·AE (−4.2): +0.1 and +1.0 give 22.2, drawn at −4.2 + 22.2 = 18.0.
  await expect(page.getByRole('region', { name: `Pathway ${CAT}` }).getByRole('textbox', { name: 'TS1 energy', exact: true })).toHaveValue('22.2');
  await expect(ts1).toHaveAccessibleName(/ΔG = 18\.0 kcal mol⁻¹/);
  await page.keyboard.press('Delete');
  await expect(level(page, 'TS1', CAT)).toHaveCount(0);
  await page.keyboard.press('Control+z');
  await expect(level(page, 'TS1', CAT)).toHaveCount(1);
});

test('a TS dragged below its neighbour raises a finding that selects the point', async ({ page }) => {
  const ts3 = level(page, 'TS3', CAT);
  const below = (await centreY(level(page, 'LA + LC', CAT))) - (await centreY(ts3)) + 25;
  await dragBy(page, ts3, 0, below);
  const findings = page.getByRole('region', { name: /^Findings/ });
  const link = findings.getByRole('button', { name: `${CAT}, TS3:` }).first();
  await expect(link).toBeVisible();
  await expect(findings).toContainText('negative barrier');
  await level(page, 'TS-th', 'Thermal').click();
  await expect(ts3).toHaveAttribute('aria-pressed', 'false');
  await link.click();
  await expect(ts3).toHaveAttribute('aria-pressed', 'true');
  await expect(pointRow(page, CAT, 6)).toHaveAttribute('aria-current', 'true');
});

test('a pasted species block adds rows; a block with a bad cell is refused and the cell named', async ({ page }) => {
  await page.getByRole('tab', { name: /Species/ }).click();
  const paste = async (text: string) => page.getByRole('textbox', { name: 'Paste a block as new species' }).evaluate((el, t) => {
    const data = new DataTransfer();
    data.setData('text/plain', t);
    el.dispatchEvent(new ClipboardEvent('paste', { clipboardData: data, bubbles: true, cancelable: true }));
  }, text);
  await paste('id\tlabel\tE\tG correction\nla\tLA\t-1205.512\t0.0412\nae\tAE\t-441.207\t0.1533\n');
  await expect(page.getByRole('textbox', { name: 'Label, row 2', exact: true })).toHaveValue('AE');
  await expect(page.getByRole('textbox', { name: 'E, row 1', exact: true })).toHaveValue('-1205.512');
  await expect(page.getByRole('tab', { name: 'Species (2)' })).toBeVisible();
  await paste('label\tE\nX\t-12.5\nY\tminus three\n');
  await expect(page.getByRole('list', { name: 'Cells that could not be read' })).toContainText('Row 4, E: expected a number in Eh (got “minus three”)');
  await expect(page.getByRole('tab', { name: 'Species (2)' })).toBeVisible();
  await page.keyboard.press('Control+z');
  await expect(page.getByRole('tab', { name: 'Species (0)' })).toBeVisible();
});

test('switching unit and quantity re-labels the axis and converts the shown energies', async ({ page }) => {
  await page.getByRole('group', { name: 'Document settings' }).getByRole('combobox', { name: 'Unit' }).selectOption('kJ/mol');
  await expect(page.getByRole('group', { name: 'Document settings' })).toContainText('Axis: ΔG / kJ mol⁻¹');
  // 31.8 kcal/mol × 4.184 kJ/kcal (thermochemical calorie, NIST SP 811 App. B) = 133.05 kJ/mol.
  await expect(pointRow(page, 'Thermal', 1).getByRole('cell').nth(4)).toHaveText('133.1');
  await expect(page.getByRole('table', { name: 'Thermal', exact: true }).getByRole('columnheader', { name: 'ΔG / kJ mol⁻¹' })).toBeVisible();
  await page.getByRole('group', { name: 'Document settings' }).getByRole('combobox', { name: 'Quantity' }).selectOption('H');
  await expect(page.getByRole('group', { name: 'Document settings' })).toContainText('Axis: ΔH / kJ mol⁻¹');
  await expect(page.locator('svg.scene text', { hasText: 'ΔH' })).toHaveCount(1);
  // The typed value keeps its own unit: the field still reads 31.8 (kcal/mol).
  await expect(page.getByRole('textbox', { name: 'TS-th energy', exact: true })).toHaveValue('31.8');
});

test('export writes an SVG and a PDF with the figure labels', async ({ page }) => {
  await page.getByRole('button', { name: 'Export…' }).click();
  const dialog = page.getByRole('dialog', { name: 'Export' });
  await expect(dialog.getByRole('img', { name: 'Preview of the exported figure' })).toBeVisible();
  let download = page.waitForEvent('download');
  await dialog.getByRole('button', { name: 'Save export…' }).click();
  const svg = readFileSync(await (await download).path(), 'utf8');
  expect(svg).toMatch(/^<\?xml/);
  expect(svg).toContain('width="175mm"');
  expect(svg).toContain('TS-th');
  expect(svg).toContain('ΔG / kcal mol⁻¹');

  await page.getByRole('button', { name: 'Export…' }).click();
  await dialog.getByRole('combobox', { name: 'What' }).selectOption('pdf');
  await dialog.getByRole('combobox', { name: 'Size' }).selectOption('single');
  download = page.waitForEvent('download');
  await dialog.getByRole('button', { name: 'Save export…' }).click();
  const file = await download;
  expect(file.suggestedFilename()).toBe('demo.pdf');
  const bytes = new Uint8Array(readFileSync(await file.path()));
  const pdf = await getDocument({ data: bytes, useSystemFonts: false, disableFontFace: true, verbosity: 0 }).promise;
  const first = await pdf.getPage(1);
  const [, , w] = first.view;
  // Single-column preset 85 mm = 85 / 25.4 × 72 pt = 240.9 pt.
  expect(w).toBeCloseTo((85 / 25.4) * 72, 0);
  const text = (await first.getTextContent()).items.map((i) => ('str' in i ? i.str : '')).join(' ');
  expect(text).toContain('TS1');
  expect(text).toContain('LA·LC');
});

test('export writes the report PDF with the figure labels and the safety caution', async ({ page }) => {
  await page.getByRole('button', { name: 'Export…' }).click();
  const dialog = page.getByRole('dialog', { name: 'Export' });
  await dialog.getByRole('combobox', { name: 'What' }).selectOption('report');
  const download = page.waitForEvent('download');
  await dialog.getByRole('button', { name: 'Save export…' }).click();
  const file = await download;
  expect(file.suggestedFilename()).toBe('demo-report.pdf');
  const pdf = await getDocument({ data: new Uint8Array(readFileSync(await file.path())), useSystemFonts: false, disableFontFace: true, verbosity: 0 }).promise;
  expect(pdf.numPages).toBeGreaterThan(1);
  let text = '';
  for (let i = 1; i <= pdf.numPages; i++) text += (await (await pdf.getPage(i)).getTextContent()).items.map((t) => ('str' in t ? t.str : '')).join(' ');
  expect(text).toContain('TS-th');
  expect(text).toMatch(/calorimetry/);
});

test('export writes a PNG at the chosen resolution', async ({ page }) => {
  await page.getByRole('button', { name: 'Export…' }).click();
  const dialog = page.getByRole('dialog', { name: 'Export' });
  await dialog.getByRole('combobox', { name: 'What' }).selectOption('png');
  await dialog.getByRole('combobox', { name: 'Resolution' }).selectOption('300');
  const download = page.waitForEvent('download');
  await dialog.getByRole('button', { name: 'Save export…' }).click();
  const png = readFileSync(await (await download).path());
  // PNG signature and IHDR width/height (ISO/IEC 15948 §5.2, §11.2.2).
  expect([...png.subarray(0, 8)]).toEqual([137, 80, 78, 71, 13, 10, 26, 10]);
  // Two-column preset 175 mm at 300 dpi: 175 / 25.4 × 300 = 2066.9 → 2067 px.
  expect(png.readUInt32BE(16)).toBe(2067);
  expect(png.readUInt32BE(20)).toBeGreaterThan(1000);
});

test('a dropped file of a newer format is refused with a message and the document stays', async ({ page }) => {
  const newer = { ...JSON.parse(demoText), version: 99, title: 'From the future' };
  await dropFile(page, JSON.stringify(newer), 'future.passline');
  const alert = page.getByRole('alert');
  await expect(alert).toContainText('future.passline could not be opened');
  await expect(alert).toContainText('format version 99');
  await expect(page.getByRole('heading', { level: 1 })).not.toHaveText('From the future');
  await expect(page.getByRole('table', { name: 'Thermal', exact: true })).toBeVisible();
});

test('every label starts its drag from where it is drawn, even one the layout moved aside', async ({ page }) => {
  const labels = page.locator('svg.overlay rect.label-hit');
  const count = await labels.count();
  expect(count).toBeGreaterThan(5);
  for (let i = 0; i < count; i++) {
    const label = labels.nth(i);
    const before = (await label.boundingBox())!;
    await dragBy(page, label, 0, 12);
    const after = (await label.boundingBox())!;
    // A 12 px drag moves the label 12 px down and not sideways (offsets kept to 0.1 mm).
    expect(Math.abs(after.x - before.x)).toBeLessThan(3);
    expect(Math.abs(after.y - before.y - 12)).toBeLessThan(3);
  }
});

test('a point is given a composition from the species sheet; a bad count is reported in place', async ({ page }) => {
  await page.getByRole('tab', { name: /Species/ }).click();
  await pasteSpecies(page, 'id\tlabel\tE\nla\tLA\t-1205.512\nae\tAE\t-441.207\n');
  await expect(page.getByRole('tab', { name: 'Species (2)' })).toBeVisible();
  await page.getByRole('tab', { name: 'Mechanism' }).click();
  const row = pointRow(page, CAT, 0);
  await row.getByRole('button', { name: 'LA + AE composition' }).click();
  await row.getByRole('combobox', { name: 'LA + AE composition species' }).selectOption({ label: 'LA' });
  await row.getByRole('button', { name: 'Add to LA + AE' }).click();
  await row.getByRole('combobox', { name: 'LA + AE composition species' }).selectOption({ label: 'AE' });
  await row.getByRole('button', { name: 'Add to LA + AE' }).click();
  await expect(row.getByRole('list', { name: 'LA + AE composition terms' })).toHaveText(/1 × LA\s*×?\s*1 × AE/);
  await row.getByRole('textbox', { name: 'LA + AE composition count' }).fill('-1');
  await row.getByRole('button', { name: 'Add to LA + AE' }).click();
  await expect(row.getByRole('alert')).toHaveText('composition term 3: the count of ae must be a positive number, got -1');
  await row.getByRole('button', { name: 'Remove AE from LA + AE' }).click();
  await expect(row.getByRole('list', { name: 'LA + AE composition terms' })).toHaveText(/^1 × LA/);
});

test('an Eyring-plot estimate takes (T, k) rows typed in its table', async ({ page }) => {
  const row = pointRow(page, CAT, 2);
  await row.getByRole('combobox', { name: 'TS1 energy given as' }).selectOption('estimate');
  await row.getByRole('combobox', { name: 'TS1 estimate method' }).selectOption('eyringFit');
  const table = row.getByRole('table', { name: 'TS1 Eyring plot data' });
  await expect(table.getByRole('textbox', { name: 'TS1 T, row 2' })).toHaveValue('318.15');
  await table.getByRole('textbox', { name: 'TS1 k, row 1' }).fill('0');
  await expect(table.getByRole('alert')).toHaveText('expected a positive rate constant in s⁻¹');
  await table.getByRole('textbox', { name: 'TS1 k, row 1' }).fill('2e-3');
  await row.getByRole('button', { name: 'Add a (T, k) row to TS1' }).click();
  await expect(table.getByRole('textbox', { name: 'TS1 T, row 3' })).toHaveValue('328.15');
  await table.getByRole('button', { name: 'Remove row 1 of TS1 Eyring plot data' }).click();
  await expect(table.getByRole('textbox', { name: 'TS1 T, row 1' })).toHaveValue('318.15');
  await expect(table.getByRole('button', { name: 'Remove row 1 of TS1 Eyring plot data' })).toBeDisabled();
});

test('the Figure tab adds a barrier arrow, the span bracket of the cycle and free text, and removes them', async ({ page }) => {
  await page.getByRole('tab', { name: 'Figure' }).click();
  await page.getByRole('combobox', { name: 'Pathway', exact: true }).selectOption({ label: CAT });
  await page.getByRole('combobox', { name: 'Arrow from', exact: true }).selectOption({ label: 'LA·AE' });
  await page.getByRole('combobox', { name: 'to', exact: true }).selectOption({ label: 'TS1' });
  await page.getByRole('button', { name: 'Add annotation' }).click();
  const list = page.getByRole('list', { name: 'Annotations on the figure' });
  await expect(list).toContainText(`Barrier arrow LA·AE → TS1 (${CAT})`);
  // The arrow is labelled with TS1 − LA·AE = 21.1 kcal/mol (the demo's typed barrier).
  await expect(page.locator('section.canvas svg.scene')).toContainText('21.1');
  await page.getByRole('combobox', { name: 'New annotation', exact: true }).selectOption('span');
  await page.getByRole('combobox', { name: 'Pathway', exact: true }).selectOption({ label: 'Thermal' });
  await expect(page.getByRole('status').filter({ hasText: 'catalytic cycle' })).toHaveText('pathway "Thermal" is not marked as a catalytic cycle');
  await page.getByRole('combobox', { name: 'Pathway', exact: true }).selectOption({ label: 'LA cycle (cycle)' });
  await page.getByRole('button', { name: 'Add annotation' }).click();
  await expect(list).toContainText('Energetic span of LA cycle');
  // The demo's cycle is hidden, so its bracket is listed as not drawn until it is shown.
  await expect(list).toContainText('not drawn: pathway "LA cycle" is hidden');
  await expect(page.locator('section.canvas svg.scene')).not.toContainText('δE =');
  await list.getByRole('button', { name: 'Show LA cycle' }).click();
  await expect(page.locator('section.canvas svg.scene')).toContainText('δE =');
  await expect(list).not.toContainText('not drawn');
  await page.getByRole('combobox', { name: 'New annotation', exact: true }).selectOption('text');
  await page.getByRole('textbox', { name: 'Text', exact: true }).fill('Lewis acid lowers TS1');
  await page.getByRole('textbox', { name: 'Text x (slots)' }).fill('2');
  await page.getByRole('textbox', { name: 'Text y (kcal mol⁻¹)' }).fill('28');
  await page.getByRole('button', { name: 'Add annotation' }).click();
  await expect(page.locator('section.canvas svg.scene')).toContainText('Lewis acid lowers TS1');
  await expect(list.getByRole('listitem')).toHaveCount(3);
  await page.getByRole('button', { name: /^Remove annotation 3: Text/ }).click();
  await expect(list.getByRole('listitem')).toHaveCount(2);
  await expect(page.locator('section.canvas svg.scene')).not.toContainText('Lewis acid lowers TS1');
});

test('the kinetics view simulates the demo cycle, puts its TOF beside the span TOF, and scans TOF or K against T', async ({ page }) => {
  await page.getByRole('tab', { name: 'Kinetics' }).click();
  await expect(page.getByRole('combobox', { name: 'Pathway', exact: true })).toHaveValue(/./);
  await page.getByRole('button', { name: 'Run simulation' }).click();
  await expect(page.getByRole('img', { name: 'Concentrations against time' })).toBeVisible();
  const simulated = (await page.getByText(/Simulated TOF .+ s⁻¹/).textContent())!.match(/Simulated TOF (\S+(?: × 10\S+)?) s⁻¹/)![1];
  await expect(page.getByRole('img', { name: 'TOF of the cycle against temperature' })).toBeVisible();
  await page.getByRole('combobox', { name: 'Plot' }).selectOption({ label: 'equilibrium constants' });
  await expect(page.getByRole('img', { name: 'Equilibrium constants against temperature' })).toBeVisible();
  // Once the simulation has run, the analysis shows its TOF next to the energetic span TOF.
  await page.getByRole('tab', { name: 'Analysis' }).click();
  await expect(page.getByText('TOF (simulated)').locator('..')).toContainText(`${simulated} s⁻¹`);
  await expect(page.getByText('TOF (energetic span)')).toBeVisible();
});
