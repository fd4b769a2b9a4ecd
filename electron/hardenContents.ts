import type { Session, WebContents } from 'electron';

/** Something to tell about a refused request (the console in the main process). */
export type Logger = (message: string) => void;

/** The parts of WebContents that hardening touches (so tests can pass a small fake). */
export type HardenableContents = Pick<WebContents, 'on' | 'setWindowOpenHandler'> & { session: Pick<Session, 'setPermissionRequestHandler' | 'setPermissionCheckHandler'> };

/**
 * Blocks every way renderer content could leave the app: navigation and redirects, new
 * windows, embedded webviews, and every permission (camera, notifications, ...).
 */
export function hardenContents(contents: HardenableContents, log: Logger): void {
  contents.on('will-navigate', (event, url) => {
    event.preventDefault();
    log(`blocked navigation to ${url.slice(0, 200)}`);
  });
  contents.on('will-redirect', (event, url) => {
    event.preventDefault();
    log(`blocked redirect to ${url.slice(0, 200)}`);
  });
  contents.on('will-attach-webview', (event) => {
    event.preventDefault();
    log('blocked a webview');
  });
  contents.setWindowOpenHandler(({ url }) => {
    log(`blocked a new window for ${url.slice(0, 200)}`);
    return { action: 'deny' };
  });
  contents.session.setPermissionRequestHandler((_contents, permission, callback) => {
    log(`denied permission ${permission}`);
    callback(false);
  });
  contents.session.setPermissionCheckHandler(() => false);
}
