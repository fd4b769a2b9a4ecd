import type { Finding, ResolvedPathway, ResolvedPoint } from '../profile/types.ts';
import { checkConditions, readMolecularity } from './conditions.ts';
import { halfLifeFirstOrder, logEquilibriumConstant, logEyringRate, rateUnit, type RateUnit } from './eyring.ts';
import { splitSteps, type StepShape } from './steps.ts';
import { stepTopEnergy } from './stepTopEnergy.ts';
import { quoteEnergy } from './quoteEnergy.ts';
import type { KineticsOptions, Molecularity, PointRef } from './types.ts';

/** Energetics and Eyring rates of one step; energy-derived values are null when an energy is unknown. */
export interface KineticStep {
  index: number;
  from: PointRef;
  /** null for a barrierless step (two minima in a row). */
  ts: PointRef | null;
  to: PointRef;
  barrierless: boolean;
  /** TS − from in J/mol as given (barrierless: max(0, ΔE)). */
  barrierForwardJ: number | null;
  /** TS − to in J/mol as given (barrierless: max(0, −ΔE)). */
  barrierReverseJ: number | null;
  /** to − from in J/mol. */
  reactionEnergyJ: number | null;
  /** The TS lies below a neighbouring minimum; rates then use the TS raised to that minimum. */
  negativeBarrier: boolean;
  kForward: number | null;
  kReverse: number | null;
  /** ln kForward, finite even where kForward underflows. */
  logKForward: number | null;
  logKReverse: number | null;
  /** K = exp(−ΔE/RT) = kForward/kReverse. */
  equilibriumConstant: number | null;
  logEquilibriumConstant: number | null;
  /** First-order forward half-life ln 2 / kForward, in s. */
  halfLifeSeconds: number | null;
  molecularityForward: Molecularity;
  molecularityReverse: Molecularity;
  unitForward: RateUnit;
  unitReverse: RateUnit;
}

const ref = (p: ResolvedPoint): PointRef => ({ id: p.id, label: p.label });

/**
 * Steps of a pathway with barriers, Eyring rate constants both ways, K and half-life.
 * Both directions run over the same TS, so kForward/kReverse = K (detailed balance) by
 * construction. A TS below a neighbouring minimum would give k > κk_BT/h: the step is
 * flagged `negativeBarrier`, a finding is added, and the rates use the TS raised to the
 * higher neighbour (a barrierless step), never k above κk_BT/h.
 */
export function analyseSteps(pathway: ResolvedPathway, options: KineticsOptions): { steps: KineticStep[]; findings: Finding[] } {
  const findings = checkConditions(options);
  if (findings.length > 0) return { steps: [], findings };
  const split = splitSteps(pathway);
  findings.push(...split.findings);
  const steps = split.steps.map((shape) => stepKinetics(pathway, shape, options, findings));
  return { steps, findings };
}

function stepKinetics(pathway: ResolvedPathway, shape: StepShape, options: KineticsOptions, findings: Finding[]): KineticStep {
  const key = shape.ts ?? shape.to;
  const m = readMolecularity(options.molecularity?.[key.id], { pathway: pathway.id, point: key.id });
  if (m.findings.length > 0) findings.push(...m.findings);
  const a = shape.from.energyJ;
  const b = shape.to.energyJ;
  const t = shape.ts === null ? (a === null || b === null ? null : stepTopEnergy(a, null, b)) : shape.ts.energyJ;
  const known = a !== null && b !== null && t !== null;
  if (!known) {
    findings.push({ severity: 'warning', code: 'step-energy-missing', message: `step ${stepName(shape)} of "${pathway.name}" has an unknown energy; its rates are not computed`, pathway: pathway.id, point: key.id });
  }
  const negativeBarrier = known && shape.ts !== null && stepTopEnergy(a, t, b) > t;
  if (negativeBarrier) {
    const below = t < a ? shape.from : shape.to;
    findings.push({ severity: 'warning', code: 'ts-below-neighbour', message: `in "${pathway.name}", TS "${shape.ts?.label}" lies ${quoteEnergy((below.energyJ ?? 0) - t, options.unit)} below "${below.label}"; the step is treated as barrierless (TS raised to the higher minimum) instead of giving k > κk_BT/h`, pathway: pathway.id, point: key.id });
  }
  // Object spreads here were ~20× slower in V8 for long pathways; one literal keeps it O(N) and fast.
  const r = known ? rates(a, t, b, options) : null;
  return {
    index: shape.index, from: ref(shape.from), ts: shape.ts && ref(shape.ts), to: ref(shape.to), barrierless: shape.ts === null,
    barrierForwardJ: known ? t - a : null, barrierReverseJ: known ? t - b : null, reactionEnergyJ: known ? b - a : null, negativeBarrier,
    kForward: r?.kForward ?? null, kReverse: r?.kReverse ?? null, logKForward: r?.logKForward ?? null, logKReverse: r?.logKReverse ?? null,
    equilibriumConstant: r ? Math.exp(r.logK) : null, logEquilibriumConstant: r?.logK ?? null, halfLifeSeconds: r ? halfLifeFirstOrder(r.kForward) : null,
    molecularityForward: m.forward, molecularityReverse: m.reverse, unitForward: rateUnit(m.forward), unitReverse: rateUnit(m.reverse),
  };
}

/** Rates over the TS raised to the higher neighbour if it lies below one. */
function rates(a: number, t: number, b: number, options: KineticsOptions) {
  const top = stepTopEnergy(a, t, b);
  const kappa = options.transmission ?? 1;
  const logKForward = logEyringRate(top - a, options.temperatureK, kappa);
  const logKReverse = logEyringRate(top - b, options.temperatureK, kappa);
  return { logKForward, logKReverse, kForward: Math.exp(logKForward), kReverse: Math.exp(logKReverse), logK: logEquilibriumConstant(b - a, options.temperatureK) };
}

function stepName(shape: StepShape): string {
  return `"${shape.from.label}" → ${shape.ts ? `"${shape.ts.label}" → ` : ''}"${shape.to.label}"`;
}
