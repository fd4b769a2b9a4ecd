import type { Structure } from '../model/schema.ts';
import { rrhoFromMoments } from '../thermo/rrho/rrhoThermo.ts';
import { fromJoulesPerMol } from '../units/energy.ts';

/**
 * H and G corrections (hartree) of a structure recomputed exactly at temperature `t` from
 * the frequencies and RRHO data it carries, or null when it carries none (then the caller
 * falls back to G ≈ H − T·S).
 */
export function rrhoCorrectionsAt(s: Structure, t: number): { h: number; g: number } | null {
  if (!s.rrho || !s.frequencies) return null;
  const { masses, quasiHarmonic, cutoffCm1, ...rest } = s.rrho;
  const r = rrhoFromMoments({
    ...rest, momentsUA2: rest.momentsUA2 as [number, number, number], massLabel: masses,
    frequenciesCm1: s.frequencies, temperatureK: t, quasiHarmonic: { method: quasiHarmonic, cutoffCm1 },
  });
  return { h: fromJoulesPerMol(r.enthalpy, 'hartree'), g: fromJoulesPerMol(r.gibbs, 'hartree') };
}
