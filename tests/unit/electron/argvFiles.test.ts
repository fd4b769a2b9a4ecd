import { describe, expect, it } from 'vitest';
import { join, resolve } from 'node:path';
import { documentPathsFromArgv } from '../../../electron/argvFiles.ts';
import { acceptSystemPath } from '../../../electron/systemPath.ts';

const cwd = resolve('/home/u/work');

describe('documentPathsFromArgv', () => {
  it('takes documents after the launcher arguments, made absolute against the launch folder', () => {
    expect(documentPathsFromArgv(['/opt/Passline/passline', 'route.passline'], 1, cwd)).toEqual([join(cwd, 'route.passline')]);
    expect(documentPathsFromArgv(['/usr/bin/electron', '.', '../b.PASSLINE', resolve('/tmp/c.passline')], 2, cwd)).toEqual([resolve('/home/u/b.PASSLINE'), resolve('/tmp/c.passline')]);
  });

  it('skips options, the launcher itself, other files and paths with NUL', () => {
    const argv = ['/opt/Passline/passline', '--allow-file-access-from-files', '-psn_0_12345', 'notes.txt', 'a.passline\u0000.txt', 'evil\u0000.passline', 'x.passline.bak'];
    expect(documentPathsFromArgv(argv, 1, cwd)).toEqual([]);
    // In development the app folder (".") is not a document even if it were named like one.
    expect(documentPathsFromArgv(['/usr/bin/electron', 'app.passline'], 2, cwd)).toEqual([]);
  });
});

describe('acceptSystemPath', () => {
  it('accepts absolute .passline paths in normal form', () => {
    expect(acceptSystemPath(resolve('/home/u/x/../route.passline'))).toBe(resolve('/home/u/route.passline'));
  });

  it('refuses relative paths, other extensions, NUL, over-long paths and non-strings', () => {
    expect(acceptSystemPath('route.passline')).toBeNull();
    expect(acceptSystemPath(resolve('/home/u/.bashrc'))).toBeNull();
    expect(acceptSystemPath(`${resolve('/home/u/a')}\u0000.passline`)).toBeNull();
    expect(acceptSystemPath(resolve(`/${'a'.repeat(5000)}.passline`))).toBeNull();
    expect(acceptSystemPath(42)).toBeNull();
  });
});
