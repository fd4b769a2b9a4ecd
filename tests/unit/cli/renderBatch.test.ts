import { describe, expect, it } from 'vitest';
import { copyFileSync, existsSync, mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { passline, ROOT } from './cliBin.ts';

// End-to-end: the installed command as a real process on real files.
const TABLE = 'pathway,label,kind,G [kcal/mol]\nA,R,min,0\nA,TS,ts,12.0\nA,P,min,-5\n';

function folderWith(files: Record<string, string>): string {
  const dir = mkdtempSync(join(tmpdir(), 'passline-batch-'));
  copyFileSync(`${ROOT}assets/demo/demo.passline`, join(dir, 'demo.passline'));
  for (const [name, text] of Object.entries(files)) writeFileSync(join(dir, name), text);
  return dir;
}

describe('passline render FILE... --out-dir DIR --format F', { timeout: 60_000 }, () => { // real processes on a shared 2-core machine
  it('renders every input in one run, named after the inputs, into a folder it creates', () => {
    const dir = folderWith({ 'route.csv': TABLE });
    for (const format of ['svg', 'pdf', 'png']) {
      const run = passline(['render', 'demo.passline', 'route.csv', '--out-dir', `figures/${format}`, '--format', format], dir);
      expect({ status: run.status, stderr: run.stderr }).toEqual({ status: 0, stderr: '' });
      expect(readdirSync(join(dir, 'figures', format)).sort()).toEqual([`demo.${format}`, `route.${format}`]);
    }
    const svg = readFileSync(join(dir, 'figures/svg/route.svg'), 'utf8');
    expect(svg).toContain('<svg ');
    expect(svg).toContain('+12.0');
    expect(readFileSync(join(dir, 'figures/pdf/demo.pdf')).subarray(0, 5).toString('latin1')).toBe('%PDF-');
    expect([...readFileSync(join(dir, 'figures/png/demo.png')).subarray(0, 4)]).toEqual([0x89, 0x50, 0x4e, 0x47]); // PNG signature (ISO/IEC 15948)
  });

  it('writes the same figure as a render of that file alone', () => {
    const dir = folderWith({ 'route.csv': TABLE });
    expect(passline(['render', 'demo.passline', 'route.csv', '--out-dir', 'many', '--format', 'svg'], dir).status).toBe(0);
    expect(passline(['render', 'route.csv', '-o', 'alone.svg'], dir).status).toBe(0);
    expect(readFileSync(join(dir, 'many/route.svg'), 'utf8')).toBe(readFileSync(join(dir, 'alone.svg'), 'utf8'));
  });

  it('carries on past bad inputs, names each with its problem, and exits 1', () => {
    const dir = folderWith({ 'broken.passline': '{"format":"passline",', 'route.csv': TABLE, 'bad.csv': 'pathway,label,kind,G [kcal/mol]\nA,R,min,zero\n' });
    const run = passline(['render', 'broken.passline', 'demo.passline', 'missing.passline', 'bad.csv', 'route.csv', '--out-dir', 'out', '--format', 'pdf'], dir);
    expect(run.status).toBe(1);
    const lines = run.stderr.trimEnd().split('\n');
    expect(lines[0]).toMatch(/^passline render: broken\.passline: .*not valid JSON/);
    expect(lines[1]).toBe('passline render: cannot read missing.passline: ENOENT');
    expect(lines[2]).toBe('passline render: bad.csv: line 2, column "G [kcal/mol]" ("zero"): expected a number');
    expect(lines[3]).toBe('passline render: 3 of 5 inputs failed: broken.passline, missing.passline, bad.csv');
    expect(readdirSync(join(dir, 'out')).sort()).toEqual(['demo.pdf', 'route.pdf']);
  });

  it('refuses, before writing anything, two inputs that would share an output and options that clash', () => {
    const dir = folderWith({ 'demo.csv': TABLE });
    const clash = passline(['render', 'demo.passline', 'demo.csv', '--out-dir', 'out', '--format', 'svg'], dir);
    expect(clash.status).toBe(2);
    expect(clash.stderr).toContain('demo.passline and demo.csv would both be written to out/demo.svg');
    expect(existsSync(join(dir, 'out/demo.svg'))).toBe(false);
    expect(passline(['render', 'demo.passline', 'demo.csv', '-o', 'x.svg'], dir).stderr).toContain('-o names one output but 2 inputs were given');
    expect(passline(['render', 'demo.passline', '--out-dir', 'out'], dir).stderr).toContain('--out-dir needs --format svg, pdf or png');
    expect(passline(['render', 'demo.passline', '--out-dir', 'out', '--format', 'eps'], dir).stderr).toContain('--format: expected one of svg, pdf, png, got "eps"');
    const badOption = passline(['render', 'demo.passline', 'demo.csv', '--out-dir', 'out', '--format', 'svg', '--preset', 'poster'], dir);
    expect(badOption.status).toBe(2);
    expect(badOption.stderr.trimEnd().split('\n')).toHaveLength(1); // said once, not once per input
  });
});
