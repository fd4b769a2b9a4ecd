import { afterAll, describe, expect, it } from 'vitest';
import { mkdirSync, mkdtempSync, rmSync, symlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { APP_INDEX_URL, appFilePath, serveAppFile } from '../../../electron/appProtocol.ts';

const base = mkdtempSync(join(tmpdir(), 'passline-scheme-'));
const root = join(base, 'renderer');
mkdirSync(join(root, 'assets'), { recursive: true });
writeFileSync(join(root, 'index.html'), '<!doctype html>');
writeFileSync(join(root, 'assets', 'app.js'), 'export {}');
writeFileSync(join(base, 'secret.js'), 'alert(1)');
symlinkSync(join(base, 'secret.js'), join(root, 'assets', 'link.js'));
afterAll(() => rmSync(base, { recursive: true, force: true }));

describe('the app scheme', () => {
  it('serves files of the renderer folder with their type', async () => {
    const page = await serveAppFile(root, APP_INDEX_URL);
    expect(page.status).toBe(200);
    expect(page.headers.get('content-type')).toBe('text/html; charset=utf-8');
    const script = await serveAppFile(root, 'passline-app://app/assets/app.js?v=1');
    expect([script.status, await script.text()]).toEqual([200, 'export {}']);
  });

  it('serves nothing outside it: parent paths, encoded parents, symbolic links, other hosts and schemes', async () => {
    for (const url of ['passline-app://app/../secret.js', 'passline-app://app/%2e%2e/secret.js', 'passline-app://app/assets/%2e%2e%2f%2e%2e%2fsecret.js',
      'passline-app://app/assets/link.js', 'passline-app://other/index.html', 'file:///etc/passwd', 'passline-app://app/missing.js', 'passline-app://app/%00.js']) {
      expect((await serveAppFile(root, url)).status, url).toBe(404);
    }
    expect(appFilePath(root, 'passline-app://app/%E0%A4%A.js')).toBeNull();
  });
});
