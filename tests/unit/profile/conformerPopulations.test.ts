import { describe, expect, it } from 'vitest';
import { conformerPopulations } from '../../../core/profile/conformerPopulations.ts';
import { makeDocument } from '../../../core/model/load.ts';
import type { DocumentInput, Species } from '../../../core/model/schema.ts';

type StructureInput = NonNullable<DocumentInput['species']>[number]['structures'];

// Constants written out here so the check does not lean on core/units: R = N_A k_B exactly
// and 1 Eh = 627.5094740630558 kcal/mol (CODATA 2018, REFERENCE.md §1); 1 kcal = 4184 J
// (thermochemical calorie, NIST SP 811 App. B).
const R = 8.31446261815324;
const KCAL_PER_HARTREE = 627.5094740630558;
const hartree = (kcal: number) => kcal / KCAL_PER_HARTREE;

/** An invented species with the given conformers. */
function speciesWith(structures: StructureInput, correctionTemperatureK?: number): Species {
  return makeDocument({ species: [{ id: 's', label: 'S', structures, ...(correctionTemperatureK ? { correctionTemperatureK } : {}) }], pathways: [] }).species[0]!;
}

describe('conformerPopulations', () => {
  it('two conformers 1.0 kcal/mol apart in G at 298.15 K: p = 1/(1 + exp(−ΔG/RT)) by hand', () => {
    const s = speciesWith([
      { electronic: -400.1, gCorrection: 0.2 },
      { electronic: -400.1, gCorrection: 0.2 + hartree(1.0) },
    ]);
    const result = conformerPopulations(s, { quantity: 'G', temperatureK: 298.15 });
    // ΔG/RT = 4184 / (8.31446261815324 × 298.15) = 1.687807; p_low = 1/(1 + e^−1.687807) = 0.843935.
    const pLow = 1 / (1 + Math.exp(-4184 / (R * 298.15)));
    expect(pLow).toBeCloseTo(0.84394, 5); // the same by hand (python3 math.exp): 0.843935…
    expect(result.ok && result.quantity === 'G' && result.temperatureK === 298.15).toBe(true);
    if (!result.ok) return;
    expect(result.populations[0]).toBeCloseTo(pLow, 9);
    expect(result.populations[1]).toBeCloseTo(1 - pLow, 9);
    expect(result.rescaled).toBe(false);
  });

  it('weights by G even when the document resolves H or E: G = 0.0, 0.5, 1.2 kcal/mol give REFERENCE.md §8 populations', () => {
    // REFERENCE.md §8 (Boltzmann distribution, McQuarrie, Statistical Mechanics (1976)):
    // populations 0.6402155195, 0.2753110573, 0.08447342317 at 298.15 K. The H values run the
    // other way, so this shows the G basis is the one used (the old code weighted by H).
    const s = speciesWith([0, 0.5, 1.2].map((kcal, i) => ({ electronic: -300, hCorrection: hartree(2 - i), gCorrection: hartree(kcal) })));
    for (const quantity of ['H', 'E'] as const) {
      const result = conformerPopulations(s, { quantity, temperatureK: 298.15 });
      expect(result.ok && result.basis).toBe('G');
      if (!result.ok) return;
      [0.6402155195, 0.2753110573, 0.08447342317].forEach((p, i) => expect(result.populations[i]).toBeCloseTo(p, 8));
    }
  });

  it('falls back to exp(−E/RT) weights only when a conformer has no G correction', () => {
    const s = speciesWith([0, 0.5, 1.2].map((kcal) => ({ electronic: -300 + hartree(kcal) })));
    const result = conformerPopulations(s, { quantity: 'E', temperatureK: 298.15 });
    expect(result.ok && result.basis).toBe('E');
    if (!result.ok) return;
    [0.6402155195, 0.2753110573, 0.08447342317].forEach((p, i) => expect(result.populations[i]).toBeCloseTo(p, 8));
  });

  it('uses the single point when given, and says when G was carried to another temperature', () => {
    // At T = 2·T0 the G of each conformer is base + H − 2(H − G) = base + 2G − H, so the two
    // below differ by 2 × 0.5 kcal/mol = 1.0 kcal/mol at 596.3 K (hand algebra).
    const s = speciesWith([
      { electronic: 5, singlePoint: -400.1, hCorrection: 0.3, gCorrection: 0.2 },
      { electronic: 7, singlePoint: -400.1, hCorrection: 0.3, gCorrection: 0.2 + hartree(0.5) },
    ], 298.15);
    const result = conformerPopulations(s, { quantity: 'G', temperatureK: 596.3 });
    if (!result.ok) throw new Error(result.message);
    expect(result.rescaled).toBe(true);
    expect(result.populations[0]).toBeCloseTo(1 / (1 + Math.exp(-4184 / (R * 596.3))), 9);
  });

  it('names the conformer whose correction is missing', () => {
    const s = speciesWith([{ electronic: -1, gCorrection: 0.1 }, { electronic: -1 }]);
    expect(conformerPopulations(s, { quantity: 'G', temperatureK: 298.15 })).toEqual({ ok: false, quantity: 'G', temperatureK: 298.15, message: 'conformer 2 has no thermal correction to G' });
    expect(conformerPopulations(speciesWith([]), { quantity: 'E', temperatureK: 298.15 }).ok).toBe(false);
  });
});
