import type { Finding } from '../types.ts';
import { showEnergy, type CheckInput } from './checkContext.ts';

/**
 * Our own threshold for the caution, −100 kJ/mol (about −24 kcal/mol): no single
 * authoritative value exists; process-safety practice judges heat release per mass and the
 * adiabatic temperature rise, which an energy profile cannot give.
 */
export const EXOTHERM_CAUTION_J = -100_000;

export const SAFETY_CAUTION = 'energies here are not a process-safety assessment; before scale-up confirm by calorimetry and defer to local codes and licensed practice';

/** A strongly exothermic (or exergonic) step or overall reaction gets the usual caution, once per pathway. */
export function checkExothermCaution({ doc, pathways, ctx }: CheckInput): Finding[] {
  if (ctx.quantity === 'E') return [];
  const findings: Finding[] = [];
  for (const pathway of pathways) {
    const minima = pathway.points.filter((p) => p.kind === 'min' && p.energyJ !== null);
    let drop = minima.length > 1 ? minima.at(-1)!.energyJ! - minima[0]!.energyJ! : 0;
    for (let i = 1; i < minima.length; i++) drop = Math.min(drop, minima[i]!.energyJ! - minima[i - 1]!.energyJ!);
    if (drop < EXOTHERM_CAUTION_J) {
      const what = ctx.quantity === 'H' ? 'exothermic' : 'exergonic (likely strongly exothermic)';
      findings.push({ severity: 'info', code: 'safety-caution', pathway: pathway.id, message: `"${pathway.name}" is strongly ${what}, down to ${showEnergy(doc, drop)}: ${SAFETY_CAUTION}` });
    }
  }
  return findings;
}
