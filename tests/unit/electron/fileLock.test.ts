import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { spawn } from 'node:child_process';
import { mkdtempSync, readFileSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import lockfile from 'proper-lockfile';
import { FileLockedError } from '../../../core/io/withFileLock.node.ts';
import { backupPathOf, saveWithBackup } from '../../../electron/saveWithBackup.ts';

const child = fileURLToPath(new URL('./helpers/lockInTurns.ts', import.meta.url));
let folder: string;
beforeEach(() => { folder = mkdtempSync(join(tmpdir(), 'passline-lock-')); });
afterEach(() => rmSync(folder, { recursive: true, force: true }));

function runChild(target: string, name: string, count: number, log: string): Promise<number | null> {
  const proc = spawn(process.execPath, ['--import', 'tsx', child, target, name, String(count), log], { stdio: ['ignore', 'inherit', 'inherit'] });
  return new Promise((resolve) => proc.once('exit', resolve));
}

describe('saves of one file by two processes', () => {
  it('take turns: critical sections never overlap, and the backup is always a whole earlier version', async () => {
    const target = join(folder, 'shared.passline');
    const log = join(folder, 'turns.log');
    writeFileSync(log, '');
    const codes = await Promise.all([runChild(target, 'A', 25, log), runChild(target, 'B', 25, log)]);
    expect(codes).toEqual([0, 0]);
    const lines = readFileSync(log, 'utf8').trim().split('\n');
    expect(lines).toHaveLength(100);
    for (let i = 0; i < lines.length; i += 2) {
      const who = lines[i]!.split(' ')[0];
      expect([lines[i], lines[i + 1]]).toEqual([`${who} in`, `${who} out`]);
    }
    const last = readFileSync(target, 'utf8');
    const backup = readFileSync(backupPathOf(target), 'utf8');
    expect(last).toMatch(/^[AB]-24$/);
    expect(backup).toMatch(/^[AB]-\d+$/);
    expect(backup).not.toBe(last);
    expect(readdirSync(folder).filter((n) => n.endsWith('.lock'))).toEqual([]);
  }, 90_000);

  it('says clearly when another process holds the file, and writes nothing', async () => {
    const target = join(folder, 'held.passline');
    writeFileSync(target, 'old');
    // Held as another Passline process holds it (the same staleness: refreshed every second).
    const release = await lockfile.lock(target, { realpath: false, stale: 2_000, update: 1_000 });
    try {
      const save = saveWithBackup(target, 'new');
      await expect(save).rejects.toBeInstanceOf(FileLockedError);
      await expect(save).rejects.toThrow('held.passline is being saved by another program (it holds held.passline.lock); nothing was written, try again in a moment');
      expect(readFileSync(target, 'utf8')).toBe('old');
      expect(readdirSync(folder).sort()).toEqual(['held.passline', 'held.passline.lock']);
    } finally {
      await release();
    }
  }, 30_000);
});
