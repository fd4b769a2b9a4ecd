import { describe, expect, it, vi } from 'vitest';
import { hardenContents, type HardenableContents } from '../../../electron/hardenContents.ts';

/** A web-contents stand-in that records the handlers hardening installs. */
function fakeContents() {
  const listeners = new Map<string, (...args: unknown[]) => void>();
  let openHandler: ((details: { url: string }) => { action: string }) | undefined;
  let requestHandler: ((wc: unknown, permission: string, callback: (granted: boolean) => void) => void) | undefined;
  let checkHandler: ((...args: unknown[]) => boolean) | undefined;
  const contents = {
    on: (event: string, listener: (...args: unknown[]) => void) => void listeners.set(event, listener),
    setWindowOpenHandler: (handler: typeof openHandler) => void (openHandler = handler),
    session: {
      setPermissionRequestHandler: (handler: typeof requestHandler) => void (requestHandler = handler),
      setPermissionCheckHandler: (handler: typeof checkHandler) => void (checkHandler = handler),
    },
  };
  return { contents: contents as unknown as HardenableContents, listeners, open: () => openHandler!, request: () => requestHandler!, check: () => checkHandler! };
}

describe('hardenContents', () => {
  it('cancels every navigation and redirect, and logs it', () => {
    const fake = fakeContents();
    const log = vi.fn();
    hardenContents(fake.contents, log);
    for (const name of ['will-navigate', 'will-redirect']) {
      const event = { preventDefault: vi.fn() };
      fake.listeners.get(name)!(event, 'https://example.org/');
      expect(event.preventDefault).toHaveBeenCalled();
    }
    expect(log).toHaveBeenCalledWith('blocked navigation to https://example.org/');
  });

  it('refuses webviews and new windows', () => {
    const fake = fakeContents();
    hardenContents(fake.contents, () => undefined);
    const event = { preventDefault: vi.fn() };
    fake.listeners.get('will-attach-webview')!(event);
    expect(event.preventDefault).toHaveBeenCalled();
    expect(fake.open()({ url: 'https://example.org/' })).toEqual({ action: 'deny' });
  });

  it('denies every permission request and check', () => {
    const fake = fakeContents();
    hardenContents(fake.contents, () => undefined);
    const callback = vi.fn();
    fake.request()(null, 'media', callback);
    expect(callback).toHaveBeenCalledWith(false);
    expect(fake.check()(null, 'notifications')).toBe(false);
  });
});
