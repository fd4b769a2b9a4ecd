import { describe, expect, it } from 'vitest';
import { windowOptions } from '../../../electron/windowOptions.ts';

// Required settings from Electron's security checklist ("Security" tutorial, electronjs.org),
// as demanded by issue 7.
describe('windowOptions', () => {
  const { webPreferences } = windowOptions('/app/preload.cjs');

  it('isolates and sandboxes the renderer and gives it no Node', () => {
    expect(webPreferences).toMatchObject({ contextIsolation: true, sandbox: true, nodeIntegration: false, nodeIntegrationInWorker: false, nodeIntegrationInSubFrames: false });
  });

  it('keeps web security on and refuses insecure content and webviews', () => {
    expect(webPreferences).toMatchObject({ webSecurity: true, allowRunningInsecureContent: false, webviewTag: false, navigateOnDragDrop: false });
  });

  it('loads the given preload script', () => {
    expect(webPreferences?.preload).toBe('/app/preload.cjs');
  });

  it('opens at the remembered place, or centred at the default size without x and y', () => {
    expect(windowOptions('/p', { x: 10, y: 20, width: 900, height: 700 })).toMatchObject({ x: 10, y: 20, width: 900, height: 700, minWidth: 640, minHeight: 420 });
    const centred = windowOptions('/p', { width: 1200, height: 800 });
    expect(centred).not.toHaveProperty('x');
    expect(centred).toMatchObject({ width: 1200, height: 800 });
  });
});
