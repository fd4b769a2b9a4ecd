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
});
