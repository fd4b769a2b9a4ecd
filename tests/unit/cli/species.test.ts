import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { main } from '../../../core/cli/main.ts';
import type { CliIo } from '../../../core/cli/io.ts';

const root = new URL('../../../', import.meta.url);
const fixture = (name: string) => readFileSync(new URL(`tests/fixtures/qc/${name}`, root), 'utf8');
const ORCA = fixture('orca6-dvb-freq.out');

async function run(argv: string[], files: Record<string, string>) {
  let out = '', err = '';
  const io: CliIo = {
    out: (t) => { out += t; }, err: (t) => { err += t; },
    readFile: (path) => { if (path in files) return files[path]!; throw Object.assign(new Error('missing'), { code: 'ENOENT' }); },
    readBytes: () => new Uint8Array(), writeFile: () => {},
  };
  return { code: await main(argv, io), out, err };
}

describe('passline species', () => {
  it('--json lists per file what was read, the program\'s corrections with T and p, and the recomputed H, S, G', async () => {
    const { code, out } = await run(['species', 'dvb.log', 'dvb6.out', '--json'], { 'dvb.log': fixture('g16-dvb-freq.log'), 'dvb6.out': ORCA });
    expect(code).toBe(0);
    const report = JSON.parse(out);
    expect(report).toMatchObject({ temperatureK: 298.15, pressureAtm: 1, quasiHarmonic: 'off', cutoffCm1: 100, errors: [] });
    const [g, o] = report.files;
    expect(g).toMatchObject({ file: 'dvb.log', program: 'gaussian', charge: 0, multiplicity: 1, formula: 'C10H10', electronicEnergyHartree: -382.308266602, imaginaryCount: 0,
      programCorrections: { temperatureK: 298.15, pressureAtm: 1, hCorrectionHartree: 0.18696, gCorrectionHartree: 0.143352 } });
    expect(g.frequenciesCm1).toHaveLength(54);
    // Recomputed at the same T as Gaussian's own: agrees to its 6 printed decimals.
    expect(g.recomputed.hCorrectionHartree).toBeCloseTo(0.18696, 6);
    expect(g.recomputed.gCorrectionHartree).toBeCloseTo(0.143352, 6);
    expect(g.recomputed.entropyJPerMolK / 4.184).toBeCloseTo(91.781, 3);
    expect(g.recomputed.method).toContain('harmonic for all modes');
    expect(o).toMatchObject({ file: 'dvb6.out', program: 'orca', programCorrections: { entropyModel: 'Grimme quasi-RRHO entropy, 100 cm⁻¹' } });
    expect(report.species.map((s: { id: string }) => s.id)).toEqual(['dvb', 'dvb6']);
  });

  it('--quasi-harmonic grimme reproduces ORCA 6\'s own quasi-RRHO G at its temperature', async () => {
    const { out } = await run(['species', 'dvb6.out', '--json', '--quasi-harmonic', 'grimme', '--cutoff', '100'], { 'dvb6.out': ORCA });
    const [o] = JSON.parse(out).files;
    expect(o.recomputed.gCorrectionHartree).toBeCloseTo(0.14396165, 6); // printed as G-E(el) in cclib's ORCA 6 dvb_ir.out
    expect(o.recomputed.method).toContain("Grimme's quasi-RRHO entropy below 100 cm⁻¹");
  });

  it('prints a review table with the pair of a single point and its frequency file', async () => {
    const sp = ORCA.slice(0, ORCA.indexOf('-----------------------\nVIBRATIONAL FREQUENCIES'));
    const { code, out } = await run(['species', 'dvb_sp.out', 'dvb_freq.log', '--temperature', '350'], { 'dvb_sp.out': sp, 'dvb_freq.log': fixture('g16-dvb-freq.log') });
    expect(code).toBe(0);
    expect(out).toContain('Species at 350 K, 1 atm; low modes: harmonic');
    expect(out).toMatch(/dvb\s+dvb_sp\.out \+ dvb_freq\.log\s+orca\s+b3lyp sto-3g \/\/ b3lyp\/sto-3g\s+-382\.055107/);
    expect(out).toContain('note: dvb_sp.out: missing the normal-termination line (the file ends early)');
  });

  it('names unreadable files and bad options', async () => {
    const missing = await run(['species', 'nope.log'], {});
    expect(missing.code).toBe(1);
    expect(missing.err).toContain('passline species: cannot read nope.log: ENOENT');
    expect((await run(['species'], {})).err).toContain('species: expected one or more file arguments');
    expect((await run(['species', 'a.log', '--quasi-harmonic', 'cubic'], {})).err).toContain('--quasi-harmonic: expected grimme, truhlar or off, got "cubic"');
    expect((await run(['species', 'a.log', '--cutoff', '0'], {})).err).toContain('--cutoff: quasi-harmonic cut-off 0 cm⁻¹ is outside 1 to 1000 cm⁻¹');
    expect((await run(['species', 'a.log', '--temperature', 'warm'], {})).code).toBe(2);
  });
});
