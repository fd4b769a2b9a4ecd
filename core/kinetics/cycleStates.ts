import type { Finding, ResolvedPathway, ResolvedPoint } from '../profile/types.ts';
import { stepShapes } from './stepShapes.ts';
import { stepTopEnergy } from './stepTopEnergy.ts';

/** One state of a catalytic cycle as the energetic span model sees it. */
export interface CycleState {
  id: string;
  label: string;
  energyJ: number;
  /**
   * For a TS: 'given' as in the pathway; 'barrierless' when two minima follow each other
   * (the TS stands at the higher of them; id "a→b"); 'raised' when the given TS lay below a
   * neighbouring minimum and was raised to it.
   */
  origin: 'given' | 'barrierless' | 'raised';
}

/** I₁ … I_N, T₁ … T_N (T_i right after I_i) and ΔG_r of one turnover. */
export interface CycleStates {
  intermediates: CycleState[];
  transitionStates: CycleState[];
  reactionEnergyJ: number;
}

/**
 * Reads a cycle written I₁, T₁, I₂, …, I_N, T_N, I₁′ (I₁′ = the first state regenerated;
 * its energy minus I₁'s is ΔG_r). Two minima in a row are a barrierless step whose TS is the
 * higher of the two; a TS below a neighbouring minimum is raised to it (with a warning), the
 * same rule the step rates use. Two TSs in a row, a first or last point that is a TS, fewer
 * than two minima, or an unknown energy give error findings and no states.
 */
export function cycleStates(pathway: ResolvedPathway): { states: CycleStates | null; findings: Finding[] } {
  const fail = (code: string, message: string, point?: string) =>
    ({ states: null, findings: [{ severity: 'error' as const, code, message: `cycle "${pathway.name}": ${message}`, pathway: pathway.id, point }] });
  const pts = pathway.points;
  const unknown = pts.find((p) => p.energyJ === null);
  if (unknown) return fail('energy-missing', `the energy of "${unknown.label}" is unknown`, unknown.id);
  const first = pts[0];
  const last = pts[pts.length - 1];
  if (first === undefined || last === undefined || pts.filter((p) => p.kind === 'min').length < 2) {
    return fail('cycle-too-short', 'needs at least the first state and its regenerated copy (I₁ … I₁′)');
  }
  if (first.kind === 'ts') return fail('cycle-starts-with-ts', `the first point "${first.label}" must be the starting intermediate I₁, not a TS`, first.id);
  if (last.kind === 'ts') return fail('cycle-not-closed', `the last point "${last.label}" must be the regenerated first state I₁′ (its energy gives ΔG_r), not a TS`, last.id);
  const { steps, problems } = stepShapes(pathway);
  // With a minimum at both ends, two TSs in a row are the only way a step can fail.
  const [pair] = problems;
  if (pair?.kind === 'consecutive-ts') return fail('consecutive-ts', `TS "${pair.ts.label}" and TS "${pair.extraTs.label}" follow each other with no intermediate between`, pair.extraTs.id);
  const findings: Finding[] = [];
  const intermediates = steps.map((step) => state(step.from, 'given'));
  const transitionStates = steps.map((step) => stepTop(pathway, step.from, step.ts, step.to, findings));
  return { states: { intermediates, transitionStates, reactionEnergyJ: (last.energyJ as number) - (first.energyJ as number) }, findings };
}

function state(p: ResolvedPoint, origin: CycleState['origin']): CycleState {
  return { id: p.id, label: p.label, energyJ: p.energyJ as number, origin };
}

function stepTop(pathway: ResolvedPathway, a: ResolvedPoint, ts: ResolvedPoint | null, b: ResolvedPoint, findings: Finding[]): CycleState {
  const ea = a.energyJ as number;
  const eb = b.energyJ as number;
  if (ts === null) return { id: `${a.id}→${b.id}`, label: `${a.label} → ${b.label} (no TS)`, energyJ: stepTopEnergy(ea, null, eb), origin: 'barrierless' };
  const et = ts.energyJ as number;
  const top = stepTopEnergy(ea, et, eb);
  if (top === et) return state(ts, 'given');
  findings.push({ severity: 'warning', code: 'ts-below-neighbour', message: `cycle "${pathway.name}": TS "${ts.label}" lies below "${(et < ea ? a : b).label}"; it is raised to the higher neighbour (barrierless step)`, pathway: pathway.id, point: ts.id });
  return { ...state(ts, 'raised'), energyJ: top };
}
