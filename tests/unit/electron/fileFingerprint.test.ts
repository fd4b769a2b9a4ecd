import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { mkdtempSync, rmSync, statSync, utimesSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { diskState, fingerprintOf, readFingerprint } from '../../../electron/fileFingerprint.ts';

let folder: string;
beforeEach(() => { folder = mkdtempSync(join(tmpdir(), 'passline-print-')); });
afterEach(() => rmSync(folder, { recursive: true, force: true }));

describe('file fingerprints', () => {
  it('hashes contents with SHA-256', () => {
    // FIPS 180-4 test vector "abc" (NIST CSRC example values).
    expect(fingerprintOf('abc', 0).sha256).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad');
    expect(fingerprintOf(new Uint8Array([0xce, 0x94]), 0).size).toBe(2);
  });

  it('tells unchanged, touched, rewritten and missing files apart', async () => {
    const path = join(folder, 'a.passline');
    writeFileSync(path, 'one');
    const known = (await readFingerprint(path))!;
    expect(known.mtimeMs).toBe(statSync(path).mtimeMs);
    expect(await diskState(path, known)).toEqual({ kind: 'unchanged' });
    utimesSync(path, new Date(2020, 0, 1), new Date(2020, 0, 1));
    expect(await diskState(path, known)).toEqual({ kind: 'unchanged' });
    writeFileSync(path, 'two');
    const changed = await diskState(path, known);
    expect(changed.kind).toBe('changed');
    rmSync(path);
    expect(await diskState(path, known)).toEqual({ kind: 'missing' });
    expect(await readFingerprint(path)).toBeNull();
  });
});
