import { describe, expect, it } from 'vitest';
import { isAppSender } from '../../../electron/senderCheck.ts';

const appUrl = 'file:///opt/passline/dist/renderer/index.html';
const ids = new Set([7]);
const event = (id: number, url: string, parent: unknown = null) => ({ sender: { id }, senderFrame: { url, parent } });

describe('isAppSender', () => {
  it('accepts the top frame of an app window on the app page, with or without a fragment', () => {
    expect(isAppSender(event(7, appUrl), ids, appUrl)).toBe(true);
    expect(isAppSender(event(7, `${appUrl}#view`), ids, appUrl)).toBe(true);
  });

  it('refuses other windows, other pages, subframes and destroyed frames', () => {
    expect(isAppSender(event(8, appUrl), ids, appUrl)).toBe(false);
    expect(isAppSender(event(7, 'https://example.org/'), ids, appUrl)).toBe(false);
    expect(isAppSender(event(7, 'file:///tmp/evil.html'), ids, appUrl)).toBe(false);
    expect(isAppSender(event(7, appUrl, {}), ids, appUrl)).toBe(false);
    expect(isAppSender({ sender: { id: 7 }, senderFrame: null }, ids, appUrl)).toBe(false);
  });
});
