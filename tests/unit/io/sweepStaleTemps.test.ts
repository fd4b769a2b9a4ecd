import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { existsSync, lutimesSync, mkdtempSync, readFileSync, readdirSync, rmSync, symlinkSync, utimesSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { basename, join } from 'node:path';
import { atomicWrite } from '../../../core/io/atomicWrite.node.ts';
import { STALE_TEMP_AGE_MS, sweepStaleTemps } from '../../../core/io/sweepStaleTemps.node.ts';
import { isTempNameOf, tempPathFor } from '../../../core/io/tempName.node.ts';

let folder: string;
beforeEach(() => { folder = mkdtempSync(join(tmpdir(), 'passline-sweep-')); });
afterEach(() => rmSync(folder, { recursive: true, force: true }));

const hourAgo = () => new Date(Date.now() - 60 * 60 * 1000);

/** A file in the test folder, its modification time an hour ago unless `fresh`. */
function file(name: string, fresh = false): string {
  const path = join(folder, name);
  writeFileSync(path, `content of ${name}`);
  if (!fresh) utimesSync(path, hourAgo(), hourAgo());
  return path;
}

describe('sweepStaleTemps', () => {
  const target = () => join(folder, 'route.passline');

  it('removes an old temporary file of the target and keeps a fresh one', async () => {
    const old = file('.route.passline.0123456789ab.tmp');
    const fresh = file('.route.passline.ba9876543210.tmp', true);
    expect(await sweepStaleTemps(target())).toEqual([old]);
    expect(existsSync(old)).toBe(false);
    expect(existsSync(fresh)).toBe(true);
  });

  it('keeps files that only look alike: a user\'s .tmp, another target\'s temp, wrong tag length or case', async () => {
    const kept = [
      'notes.tmp', 'route.passline', '.route.passline.bak.0123456789ab.tmp', '.other.passline.0123456789ab.tmp',
      '.route.passline.0123456789a.tmp', '.route.passline.0123456789abc.tmp', '.route.passline.0123456789AB.tmp',
      '.route.passline.0123456789ab.tmp.keep', 'route.passline.0123456789ab.tmp',
    ];
    kept.forEach((name) => file(name));
    expect(await sweepStaleTemps(target())).toEqual([]);
    expect(readdirSync(folder).sort()).toEqual([...kept].sort());
  });

  it('neither follows nor removes a symbolic link that matches the pattern', async () => {
    const precious = file('precious.passline');
    const link = join(folder, '.route.passline.0123456789ab.tmp');
    symlinkSync(precious, link);
    lutimesSync(link, hourAgo(), hourAgo());
    expect(await sweepStaleTemps(target())).toEqual([]);
    expect(readFileSync(precious, 'utf8')).toBe('content of precious.passline');
    expect(readdirSync(folder).sort()).toEqual(['.route.passline.0123456789ab.tmp', 'precious.passline']);
  });

  it('returns nothing for a missing folder or a folder that is a file', async () => {
    expect(await sweepStaleTemps(join(folder, 'missing', 'route.passline'))).toEqual([]);
    const notAFolder = file('plain');
    expect(await sweepStaleTemps(join(notAFolder, 'route.passline'))).toEqual([]);
  });

  it('takes the age threshold as an option, ten minutes by default (our choice)', async () => {
    expect(STALE_TEMP_AGE_MS).toBe(600_000);
    const path = join(folder, '.route.passline.00000000000f.tmp');
    writeFileSync(path, 'x');
    const fiveMinutesAgo = new Date(Date.now() - 5 * 60 * 1000);
    utimesSync(path, fiveMinutesAgo, fiveMinutesAgo);
    expect(await sweepStaleTemps(target())).toEqual([]);
    expect(await sweepStaleTemps(target(), { olderThanMs: 60_000 })).toEqual([path]);
  });

  it('recognises the names atomicWrite gives its temporary files', () => {
    for (const tag of ['000000000000', 'deadbeef0123', 'ffffffffffff']) {
      expect(isTempNameOf(basename(tempPathFor(target(), tag)), target())).toBe(true);
      expect(isTempNameOf(basename(tempPathFor(join(folder, 'route.passline.bak'), tag)), target())).toBe(false);
    }
  });

  it('leaves a folder untouched after a successful atomic write of a fresh file', async () => {
    await atomicWrite(target(), 'v1');
    expect(await sweepStaleTemps(target(), { olderThanMs: 0 })).toEqual([]);
    expect(readdirSync(folder)).toEqual(['route.passline']);
  });
});
