import type { Finding, ResolvedPathway } from '../../profile/types.ts';
import { fromJoulesPerMol } from '../../units/index.ts';
import { stepTopEnergy } from '../stepTopEnergy.ts';
import type { MassActionNetwork, MassActionReaction } from './network.ts';
import { pathwaySteps } from './pathwaySteps.ts';
import { stepRateConstants } from './stepRateConstants.ts';

/** Conditions for turning a pathway into rate constants. */
export interface PathwayNetworkOptions {
  temperatureK: number;
  /** Transmission coefficient κ (default 1). */
  transmission?: number;
}

/** A network with warnings, or the error findings that prevent one. */
export type PathwayNetworkResult =
  | { ok: true; network: MassActionNetwork; findings: Finding[] }
  | { ok: false; errors: Finding[] };

/**
 * First-order chain I1 ⇌ I2 ⇌ … through the minima of a resolved pathway (energies J/mol,
 * free reagents already folded into each state, pseudo-first-order). Each step's forward
 * barrier is T − I_from through the TS between the minima, or max(0, ΔG) when there is none;
 * the reverse constant follows from detailed balance (see `stepRateConstants`).
 * For a cycle the last point is the regenerated first state (lower by ΔG_r): its step leads
 * back to the first species, and its net extent is counted as turnovers — the sequence
 * convention of Kozuch & Shaik, Acc. Chem. Res. 44, 101 (2011) (REFERENCE.md §6).
 * A TS below one of its minima is clamped to the higher minimum (`stepTopEnergy`), with a warning.
 */
export function networkFromPathway(pathway: ResolvedPathway, options: PathwayNetworkOptions): PathwayNetworkResult {
  const { steps, errors } = pathwaySteps(pathway);
  const { temperatureK, transmission = 1 } = options;
  if (!(temperatureK > 0) || !Number.isFinite(temperatureK)) errors.push({ severity: 'error', code: 'microkinetics-temperature', message: `temperature must be a positive number of kelvin, got ${temperatureK}`, pathway: pathway.id });
  if (!(transmission > 0 && transmission <= 1)) errors.push({ severity: 'error', code: 'microkinetics-transmission', message: `transmission coefficient must lie in (0, 1], got ${transmission}`, pathway: pathway.id });
  if (steps.length === 0 && errors.length === 0) errors.push({ severity: 'error', code: 'microkinetics-too-short', message: `pathway "${pathway.name}" needs at least two minima for a simulation`, pathway: pathway.id });
  if (errors.length > 0) return { ok: false, errors };
  const findings: Finding[] = [];
  const cycle = pathway.cycle;
  const minima = [steps[0]!.from, ...steps.map((s) => s.to)];
  const states = cycle ? minima.slice(0, -1) : minima;
  const reactions: MassActionReaction[] = steps.map((step, i) => {
    const dG = step.to.energyJ - step.from.energyJ;
    const direct = step.ts ? step.ts.energyJ - step.from.energyJ : 0;
    const barrier = stepTopEnergy(step.from.energyJ, step.ts?.energyJ ?? null, step.to.energyJ) - step.from.energyJ;
    if (step.ts && barrier > direct) {
      findings.push({ severity: 'warning', code: 'microkinetics-ts-below-minimum', message: `"${step.ts.label}" lies ${fromJoulesPerMol(barrier - direct, 'kcal/mol').toFixed(2)} kcal/mol below a neighbouring minimum; the simulation uses a barrier of ${fromJoulesPerMol(barrier, 'kcal/mol').toFixed(2)} kcal/mol`, pathway: pathway.id, point: step.ts.id });
    }
    const { kf, kr } = stepRateConstants(barrier, dG, temperatureK, transmission);
    const to = states[(i + 1) % states.length]!;
    return { label: `${step.from.label} → ${step.to.label}`, reactants: [{ species: step.from.id, count: 1 }], products: [{ species: to.id, count: 1 }], kf, kr };
  });
  const species = states.map((s) => s.id);
  const network: MassActionNetwork = { species, labels: states.map((s) => s.label), reactions };
  if (cycle) { network.catalyst = species; network.turnoverReaction = reactions.length - 1; }
  return { ok: true, network, findings };
}
