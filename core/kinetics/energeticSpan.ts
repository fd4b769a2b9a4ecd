import type { Finding, ResolvedPathway } from '../profile/types.ts';
import { kbtOverH, rtJoules } from '../units/index.ts';
import { checkConditions } from './conditions.ts';
import { quoteEnergy } from './quoteEnergy.ts';
import type { EnergyUnit } from '../units/energy.ts';
import { cycleStates, type CycleState } from './cycleStates.ts';
import { largestSpan, spanSums } from './spanSums.ts';

/** A cycle state with its degree of TOF control. */
export interface ControlledState extends CycleState {
  /** X_TOF: −RT ∂lnTOF/∂T_i for a TS, +RT ∂lnTOF/∂I_j for an intermediate. */
  xTof: number;
}

/** Energetic span analysis of one catalytic cycle (energies J/mol, rates s⁻¹). */
export interface EnergeticSpan {
  /** The ordering convention the numbers follow. */
  convention: string;
  temperatureK: number;
  transmission: number;
  /** ΔG_r of one turnover, I₁′ − I₁. */
  reactionEnergyJ: number;
  /** δE = max_ij δE_ij. */
  deltaEJ: number;
  /** TS and intermediate of the largest span. */
  tdts: CycleState;
  tdi: CycleState;
  /** True when the TDTS comes after the TDI within the turnover (no ΔG_r term in δE). */
  tdtsAfterTdi: boolean;
  /** TS and intermediate with the largest X_TOF; normally tdts/tdi, they can differ when spans lie within ~RT. */
  tdtsByControl: ControlledState;
  tdiByControl: ControlledState;
  /** Exact TOF, κ(k_BT/h)(1 − e^{ΔG_r/RT}) / Σ_ij e^{δE_ij/RT}; negative when the cycle runs backwards, 0 at ΔG_r = 0. */
  tof: number;
  /** ln |tof| (−Infinity at ΔG_r = 0), finite where tof underflows. */
  logAbsTof: number;
  /**
   * Energetic span approximation with the exact TOF's sign: κ(k_BT/h) e^{−δE/RT} for an
   * exergonic cycle (Kozuch & Shaik 2011), 0 at ΔG_r = 0, and for an endergonic cycle the
   * exact formula with its sum replaced by its largest term, −κ(k_BT/h)(e^{ΔG_r/RT} − 1) e^{−δE/RT}.
   */
  tofApprox: number;
  /** −RT ln(TOF / (κ k_BT/h)): the single Eyring barrier that gives the same TOF; null unless TOF > 0. */
  apparentBarrierJ: number | null;
  transitionStates: ControlledState[];
  intermediates: ControlledState[];
}

/** The turnover ordering the span numbers follow (REFERENCE.md §6 convention), for display beside results. */
export const SPAN_CONVENTION = 'one turnover is I₁ → T₁ → I₂ → … → I_N → T_N → I₁′; T_i is the TS right after I_i; I₁′ = I₁ + ΔG_r; a TS counts as after intermediate j when i ≥ j';

/**
 * Energetic span model of a catalytic cycle (Kozuch & Shaik, J. Am. Chem. Soc. 128, 3355
 * (2006); Acc. Chem. Res. 44, 101 (2011); degree of TOF control, J. Phys. Chem. A 112, 6032
 * (2008)). Compact exact form TOF = κ(k_BT/h)(1 − e^{ΔG_r/RT}) / Σ_ij e^{δE_ij/RT} with
 * δE_ij = T_i − I_j for i ≥ j and T_i − I_j + ΔG_r for i < j. Everything is summed in log
 * space with prefix sums: O(N), no overflow for thousands of states or hundreds of kcal/mol.
 * Input rules are those of `cycleStates` (barrierless steps, raised TSs).
 */
export function energeticSpan(pathway: ResolvedPathway, options: { temperatureK: number; transmission?: number; unit?: EnergyUnit }): { span: EnergeticSpan | null; findings: Finding[] } {
  const findings = checkConditions(options);
  if (findings.length > 0) return { span: null, findings };
  const read = cycleStates(pathway);
  findings.push(...read.findings);
  if (read.states === null) return { span: null, findings };
  const { intermediates, transitionStates, reactionEnergyJ } = read.states;
  const { temperatureK } = options;
  const kappa = options.transmission ?? 1;
  const rt = rtJoules(temperatureK);
  const n = intermediates.length;
  const tsE = new Float64Array(n);
  const intE = new Float64Array(n);
  const t = new Float64Array(n);
  const a = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    tsE[i] = transitionStates[i]!.energyJ;
    intE[i] = intermediates[i]!.energyJ;
    t[i] = tsE[i]! / rt;
    a[i] = -intE[i]! / rt;
  }
  const g = reactionEnergyJ / rt;
  const sums = spanSums(t, a, g);
  const logPrefactor = Math.log(kappa * kbtOverH(temperatureK));
  // |1 − e^g| in log form: ln(−expm1(g)) for g < 0, g + ln(−expm1(−g)) for g > 0 (no overflow).
  const logNumerator = g < 0 ? Math.log(-Math.expm1(g)) : g > 0 ? g + Math.log(-Math.expm1(-g)) : -Infinity;
  const logAbsTof = logPrefactor + logNumerator - sums.logTotal;
  const tof = g === 0 ? 0 : Math.sign(-g) * Math.exp(logAbsTof);
  if (g > 0) findings.push({ severity: 'warning', code: 'endergonic-cycle', message: `cycle "${pathway.name}" is endergonic (ΔG_r = ${quoteEnergy(reactionEnergyJ, options.unit)} > 0): the net turnover runs backwards and the TOF is negative`, pathway: pathway.id });
  if (g === 0) findings.push({ severity: 'info', code: 'thermoneutral-cycle', message: `cycle "${pathway.name}" has ΔG_r = 0: no net turnover at equilibrium, TOF = 0`, pathway: pathway.id });
  const control = (states: CycleState[], logs: Float64Array): ControlledState[] =>
    states.map((s, i) => ({ id: s.id, label: s.label, energyJ: s.energyJ, origin: s.origin, xTof: Math.exp(logs[i]! - sums.logTotal) }));
  const tsControl = control(transitionStates, sums.logByTs);
  const intControl = control(intermediates, sums.logByIntermediate);
  const top = largestSpan(tsE, intE, reactionEnergyJ);
  return {
    span: {
      convention: SPAN_CONVENTION, temperatureK, transmission: kappa, reactionEnergyJ,
      deltaEJ: top.deltaEJ, tdts: transitionStates[top.i]!, tdi: intermediates[top.j]!, tdtsAfterTdi: top.i >= top.j,
      tdtsByControl: mostControlling(tsControl), tdiByControl: mostControlling(intControl),
      tof, logAbsTof, tofApprox: g < 0 ? Math.exp(logPrefactor - top.deltaEJ / rt) : g === 0 ? 0 : -Math.exp(logPrefactor + logNumerator - top.deltaEJ / rt),
      apparentBarrierJ: tof > 0 ? rt * (sums.logTotal - logNumerator) : null,
      transitionStates: tsControl, intermediates: intControl,
    },
    findings,
  };
}

function mostControlling(states: ControlledState[]): ControlledState {
  return states.reduce((best, s) => (s.xTof > best.xTof ? s : best));
}
