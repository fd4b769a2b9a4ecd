import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { mkdtempSync, readdirSync, readFileSync, rmSync, utimesSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { atomicWrite } from '../../../core/io/atomicWrite.node.ts';
import { writeOutput } from '../../../core/cli/writeOutput.ts';
import type { CliIo } from '../../../core/cli/io.ts';

let folder: string;
beforeEach(() => { folder = mkdtempSync(join(tmpdir(), 'passline-cli-out-')); });
afterEach(() => rmSync(folder, { recursive: true, force: true }));

const io: CliIo = { out: () => {}, err: () => {}, readFile: () => '', readBytes: () => new Uint8Array(), writeFile: atomicWrite };

describe('writeOutput', () => {
  it('writes the file and sweeps old temporary files an interrupted write of it left', async () => {
    const stale = join(folder, '.fig.svg.a1b2c3d4e5f6.tmp');
    writeFileSync(stale, '<svg');
    const hourAgo = new Date(Date.now() - 3_600_000);
    utimesSync(stale, hourAgo, hourAgo);
    await writeOutput(join(folder, 'fig.svg'), '<svg/>', io);
    expect(readFileSync(join(folder, 'fig.svg'), 'utf8')).toBe('<svg/>');
    expect(readdirSync(folder)).toEqual(['fig.svg']);
  });

  it('turns an unwritable path into a one-line error naming it', async () => {
    await expect(writeOutput(join(folder, 'missing', 'fig.svg'), 'x', io)).rejects.toThrow(`cannot write ${join(folder, 'missing', 'fig.svg')}: ENOENT`);
  });
});
