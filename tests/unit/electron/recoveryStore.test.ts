import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { RecoveryStore } from '../../../electron/recoveryStore.ts';

let folder: string;
beforeEach(() => { folder = mkdtempSync(join(tmpdir(), 'passline-recovery-')); });
afterEach(() => rmSync(folder, { recursive: true, force: true }));

const at = (iso: string) => () => new Date(iso);

describe('RecoveryStore', () => {
  it('after a crash (no clean end), the next start offers the working copy with the time it was written', async () => {
    const crashed = new RecoveryStore(folder, at('2024-05-06T07:08:09.000Z'));
    expect(await crashed.begin()).toEqual({ previousEndedCleanly: true });
    await crashed.write({ name: 'route.passline', path: '/home/u/route.passline', text: '{"draft":true}' });
    // Simulated crash: end() is never called, so the running marker stays behind.
    const next = new RecoveryStore(folder, at('2024-05-06T09:00:00.000Z'));
    expect(await next.begin()).toEqual({ previousEndedCleanly: false });
    expect(await next.offer()).toEqual({ name: 'route.passline', path: '/home/u/route.passline', text: '{"draft":true}', savedAt: '2024-05-06T07:08:09.000Z' });
  });

  it('a clean end removes the working copy and the marker, so the next start offers nothing', async () => {
    const store = new RecoveryStore(folder);
    await store.begin();
    await store.write({ name: 'untitled.passline', text: 'x' });
    await store.end();
    expect(existsSync(join(folder, 'working-copy.json'))).toBe(false);
    expect(existsSync(join(folder, 'session.json'))).toBe(false);
    const next = new RecoveryStore(folder);
    expect(await next.begin()).toEqual({ previousEndedCleanly: true });
    expect(await next.offer()).toBeNull();
  });

  it('keeps the offer apart from the new session\'s autosaves until it is dismissed', async () => {
    const first = new RecoveryStore(folder, at('2024-01-01T00:00:00.000Z'));
    await first.begin();
    await first.write({ name: 'old.passline', text: 'old edits' });
    const second = new RecoveryStore(folder, at('2024-01-02T00:00:00.000Z'));
    await second.begin();
    await second.write({ name: 'new.passline', text: 'new edits' });
    expect((await second.offer())?.text).toBe('old edits');
    await second.dismiss();
    expect(await second.offer()).toBeNull();
    expect(JSON.parse(readFileSync(join(folder, 'working-copy.json'), 'utf8'))).toMatchObject({ name: 'new.passline', savedAt: '2024-01-02T00:00:00.000Z' });
  });

  it('a crash with a clean document (nothing autosaved, or cleared) leaves nothing to offer', async () => {
    const first = new RecoveryStore(folder);
    await first.begin();
    await first.write({ name: 'a.passline', text: 'x' });
    await first.clear();
    const next = new RecoveryStore(folder);
    expect(await next.begin()).toEqual({ previousEndedCleanly: false });
    expect(await next.offer()).toBeNull();
  });

  it('ignores a damaged or foreign working copy instead of offering it', async () => {
    const first = new RecoveryStore(folder);
    await first.begin();
    writeFileSync(join(folder, 'working-copy.json'), '{"name": 5, "text": ');
    const next = new RecoveryStore(folder);
    await next.begin();
    expect(await next.offer()).toBeNull();
    expect(existsSync(join(folder, 'working-copy.json'))).toBe(false);
  });
});
