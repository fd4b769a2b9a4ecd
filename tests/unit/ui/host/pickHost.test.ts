import { describe, expect, it } from 'vitest';
import { pickHost } from '../../../../ui/host/pickHost.ts';
import { createFakeHost } from './fakeHost.ts';

describe('pickHost', () => {
  it('uses the host that preload exposed when there is one', () => {
    const { host } = createFakeHost();
    expect(pickHost({ passlineHost: host } as unknown as Window)).toBe(host);
  });
  it('falls back to the browser host', async () => {
    expect(await pickHost(window).hostInfo()).toMatchObject({ kind: 'browser' });
  });
});
