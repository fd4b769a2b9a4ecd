// End-to-end check of the desktop app with Electron: open a document named on the command
// line, edit it, save it with the menu, and reopen it in a fresh start. Runs wherever an
// Electron binary is installed (and, on Linux, a display); otherwise every test is skipped
// with the reason printed.
import { _electron as electron, expect, test, type ElectronApplication, type Page } from '@playwright/test';
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { electronBinary } from './electronBinary.ts';

const root = fileURLToPath(new URL('../..', import.meta.url));
const found = electronBinary();
const skipReason = 'reason' in found ? `Electron end-to-end suite skipped: ${found.reason}.` : null;
if (skipReason) console.log(skipReason);
if (!skipReason && !existsSync(join(root, 'electron', 'dist', 'main.js'))) console.log('Build the app first (npm run build): electron/dist/main.js is missing.');

let folder: string;
test.beforeEach(() => { folder = mkdtempSync(join(tmpdir(), 'passline-e2e-electron-')); });
test.afterEach(() => rmSync(folder, { recursive: true, force: true }));

/** Starts the built app on `file` with a data folder of its own. */
async function launch(file: string): Promise<{ app: ElectronApplication; page: Page }> {
  const app = await electron.launch({
    executablePath: (found as { binary: string }).binary,
    args: [root, file],
    env: { ...process.env, PASSLINE_USER_DATA: join(folder, 'user-data') },
  });
  const page = await app.firstWindow();
  return { app, page };
}

/** The bundled demo with a title of this test's own, written as `name` in the test folder. */
function writeDocument(name: string, title: string): string {
  const doc = JSON.parse(readFileSync(join(root, 'assets', 'demo', 'demo.passline'), 'utf8')) as { title: string };
  doc.title = title;
  const path = join(folder, name);
  writeFileSync(path, JSON.stringify(doc, null, 2));
  return path;
}

test('opens a document from the command line, saves an edit in place, and reopens it', async () => {
  test.skip(skipReason !== null, skipReason ?? '');
  const path = writeDocument('route.passline', 'Desktop round trip');

  const first = await launch(path);
  await expect(first.page.getByRole('heading', { level: 1 })).toHaveText('Desktop round trip');
  // The editor's document title field (its accessible name is "Title").
  await first.page.getByLabel('Title', { exact: true }).fill('Desktop round trip, edited');
  await first.app.evaluate(({ Menu }) => Menu.getApplicationMenu()?.getMenuItemById('save')?.click());
  await expect.poll(() => (JSON.parse(readFileSync(path, 'utf8')) as { title: string }).title).toBe('Desktop round trip, edited');
  // The version the save replaced is kept beside it.
  expect((JSON.parse(readFileSync(`${path}.bak`, 'utf8')) as { title: string }).title).toBe('Desktop round trip');
  await first.app.close();

  const second = await launch(path);
  await expect(second.page.getByRole('heading', { level: 1 })).toHaveText('Desktop round trip, edited');
  await second.app.close();
});

test('keeps the window secure: no Node in the page, only the host objects', async () => {
  test.skip(skipReason !== null, skipReason ?? '');
  const { app, page } = await launch(writeDocument('a.passline', 'Security check'));
  const globals = await page.evaluate(() => ({
    require: typeof (window as unknown as { require?: unknown }).require,
    process: typeof (window as unknown as { process?: unknown }).process,
    host: typeof (window as unknown as { passlineHost?: unknown }).passlineHost,
    commands: typeof (window as unknown as { passlineCommands?: unknown }).passlineCommands,
  }));
  expect(globals).toEqual({ require: 'undefined', process: 'undefined', host: 'object', commands: 'object' });
  await app.close();
});
