import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { existsSync, mkdtempSync, readdirSync, readFileSync, rmSync, utimesSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { backupPathOf, saveWithBackup } from '../../../electron/saveWithBackup.ts';
import { killDelays, killMidWrite } from './helpers/killMidWrite.ts';

let folder: string;
beforeEach(() => { folder = mkdtempSync(join(tmpdir(), 'passline-backup-')); });
afterEach(() => rmSync(folder, { recursive: true, force: true }));

describe('saveWithBackup', () => {
  it('names the backup after the document with .bak added', () => {
    expect(backupPathOf(join(folder, 'route.passline'))).toBe(join(folder, 'route.passline.bak'));
  });

  it('writes a new document without a backup, then keeps exactly the previous version', async () => {
    const target = join(folder, 'route.passline');
    expect(await saveWithBackup(target, 'v1')).toBe(false);
    expect(existsSync(backupPathOf(target))).toBe(false);
    expect(await saveWithBackup(target, 'v2')).toBe(true);
    expect(await saveWithBackup(target, 'v3')).toBe(true);
    expect(readFileSync(target, 'utf8')).toBe('v3');
    expect(readFileSync(backupPathOf(target), 'utf8')).toBe('v2');
    expect(readdirSync(folder).sort()).toEqual(['route.passline', 'route.passline.bak']);
  });

  it('sweeps old temporary files that interrupted saves of the document and its backup left', async () => {
    const target = join(folder, 'route.passline');
    const hourAgo = new Date(Date.now() - 3_600_000);
    for (const name of ['.route.passline.0123456789ab.tmp', '.route.passline.bak.0123456789ab.tmp', '.other.passline.0123456789ab.tmp']) {
      writeFileSync(join(folder, name), 'torn');
      utimesSync(join(folder, name), hourAgo, hourAgo);
    }
    await saveWithBackup(target, 'v1');
    expect(readdirSync(folder).sort()).toEqual(['.other.passline.0123456789ab.tmp', 'route.passline']);
  });
});

// Killed at any moment, the document is one whole version and so is its backup.
describe('saveWithBackup under kill -9', () => {
  const size = 1_000_000;

  it('leaves the document old or new and the backup whole, at many kill points', async () => {
    const target = join(folder, 'doc.passline');
    const whole = (text: string) => text === 'A'.repeat(size) || text === 'B'.repeat(size);
    writeFileSync(target, 'A'.repeat(size));
    let backupsSeen = 0;
    for (const ms of killDelays(16)) {
      await killMidWrite(target, size, ms, 'backup');
      expect(whole(readFileSync(target, 'utf8'))).toBe(true);
      if (existsSync(backupPathOf(target))) {
        backupsSeen += 1;
        expect(whole(readFileSync(backupPathOf(target), 'utf8'))).toBe(true);
      }
    }
    expect(backupsSeen).toBeGreaterThan(0);
    // Whatever temporary files the kills left, once old they go with the next save.
    const later = new Date(Date.now() - 3_600_000);
    for (const name of readdirSync(folder).filter((n) => n.endsWith('.tmp'))) utimesSync(join(folder, name), later, later);
    await saveWithBackup(target, 'C');
    expect(readdirSync(folder).sort()).toEqual(['doc.passline', 'doc.passline.bak']);
  }, 90_000);
});
