import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { atomicWrite } from '../../../core/io/atomicWrite.node.ts';
import { killDelays, killMidWrite } from './helpers/killMidWrite.ts';

let folder: string;
beforeEach(() => { folder = mkdtempSync(join(tmpdir(), 'passline-atomic-')); });
afterEach(() => rmSync(folder, { recursive: true, force: true }));

describe('atomicWrite', () => {
  it('creates a new file with the text or bytes given, leaving no temporary file', async () => {
    await atomicWrite(join(folder, 'a.passline'), 'ΔG‡ text');
    await atomicWrite(join(folder, 'b.png'), new Uint8Array([137, 80, 78, 71]));
    expect(readFileSync(join(folder, 'a.passline'), 'utf8')).toBe('ΔG‡ text');
    expect([...readFileSync(join(folder, 'b.png'))]).toEqual([137, 80, 78, 71]);
    expect(readdirSync(folder).sort()).toEqual(['a.passline', 'b.png']);
  });

  it('replaces an existing file completely', async () => {
    const target = join(folder, 'a.passline');
    writeFileSync(target, 'old and much longer content');
    await atomicWrite(target, 'new');
    expect(readFileSync(target, 'utf8')).toBe('new');
  });

  it('fails without leaving a temporary file when the target cannot be replaced', async () => {
    const target = join(folder, 'taken.passline');
    mkdirSync(target);
    await expect(atomicWrite(target, 'x')).rejects.toThrow();
    expect(readdirSync(folder)).toEqual(['taken.passline']);
  });

  it('fails when the folder does not exist', async () => {
    await expect(atomicWrite(join(folder, 'missing', 'a.passline'), 'x')).rejects.toThrow(/ENOENT/);
  });
});

// A process killed at an arbitrary moment must leave the target as one whole version.
describe('atomicWrite under kill -9', () => {
  const size = 2_000_000;

  it('leaves the old or the new version, never a torn file, at many kill points', async () => {
    const target = join(folder, 'doc.passline');
    writeFileSync(target, 'A'.repeat(size));
    for (const ms of killDelays(16)) {
      await killMidWrite(target, size, ms, 'plain');
      const text = readFileSync(target, 'utf8');
      expect(text.length).toBe(size);
      expect(text === 'A'.repeat(size) || text === 'B'.repeat(size)).toBe(true);
    }
  }, 90_000);
});
