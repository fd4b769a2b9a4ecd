import type { Estimate, PointKind } from '../model/schema.ts';
import { toJoulesPerMol, unitLabel } from '../units/energy.ts';
import { rtJoules } from '../units/thermal.ts';
import { marcusBarrier } from '../thermo/estimates/marcus.ts';
import { bepBarrier } from '../thermo/estimates/bep.ts';
import { barrierFromHalfLifeJ, barrierFromRateConstantJ } from '../thermo/estimates/inverseEyring.ts';
import { eyringFit } from '../thermo/estimates/eyringFit.ts';
import { arrheniusFit } from '../thermo/estimates/arrhenius.ts';
import type { ResolveContext } from './context.ts';
import type { RawPoint } from './resolvePathway.ts';
import type { Finding } from './types.ts';
import type { RawEnergy } from './scale.ts';

interface Neighbour { raw: RawEnergy; label: string }
interface EstimateInput { ctx: ResolveContext; where: { pathway: string; point: string }; before: Neighbour | null; after: Neighbour | null }
type Outcome = { barrierJ: number; detail: string; findings: Finding[]; approximations: string[] } | { error: string; code?: string };

const kcal = (j: number) => `${(j / 4184).toFixed(2)} kcal mol⁻¹`;

function evaluate(estimate: Estimate, input: EstimateInput): Outcome {
  const { ctx, where, before, after } = input;
  const t = ctx.temperatureK;
  const findings: Finding[] = [];
  const approximations: string[] = [];
  const warn = (message: string) => findings.push({ severity: 'warning', code: 'estimate-outside-validity', ...where, message });
  const stepEnergy = (): number | string => {
    if (!after) return 'needs a minimum after the transition state';
    if (before!.raw.valueJ === null || after.raw.valueJ === null) return 'needs the energies of the minima on both sides';
    return after.raw.valueJ - before!.raw.valueJ;
  };
  const atOtherT = (tData: number | undefined) => {
    if (tData !== undefined && Math.abs(tData - t) > 1e-9) approximations.push(`measured at ${tData} K, Δ‡G taken as unchanged at ${t} K`);
  };
  switch (estimate.method) {
    case 'marcus': {
      const dG = stepEnergy();
      if (typeof dG === 'string') return { error: `Marcus estimate ${dG}` };
      const m = marcusBarrier(dG, toJoulesPerMol(estimate.lambda, estimate.unit));
      if (m.inverted) warn(`Marcus estimate in the inverted region (ΔG° = ${kcal(dG)} < −λ): the classical form is doubtful there`);
      return { barrierJ: m.barrierJ, detail: `Marcus estimate, λ = ${estimate.lambda} ${unitLabel(estimate.unit)}, ΔG° = ${kcal(dG)}, α = ${m.alpha.toFixed(3)}`, findings, approximations };
    }
    case 'bep': {
      const dH = stepEnergy();
      if (typeof dH === 'string') return { error: `Bell–Evans–Polanyi estimate ${dH}` };
      const b = bepBarrier(toJoulesPerMol(estimate.e0, estimate.unit), estimate.alpha, dH);
      if (b.alphaOutOfRange) warn(`Bell–Evans–Polanyi α = ${estimate.alpha} lies outside [0, 1]`);
      // The step energy is in the profile's quantity; BEP lines are drawn against ΔH, so say which was used.
      const symbol = `Δ${ctx.quantity}`;
      if (b.belowThermodynamicLimit) warn(`Bell–Evans–Polanyi estimate ${kcal(b.barrierJ)} is below max(0, ${symbol}) = ${kcal(Math.max(0, dH))}`);
      if (ctx.quantity !== 'H') approximations.push(`Bell–Evans–Polanyi line applied to the step's ${symbol} in place of ΔH`);
      return { barrierJ: b.barrierJ, detail: `Bell–Evans–Polanyi estimate E₀ = ${estimate.e0} ${unitLabel(estimate.unit)}, α = ${estimate.alpha}, step ${symbol} = ${kcal(dH)}`, findings, approximations };
    }
    case 'rateConstant': {
      const tData = estimate.temperatureK ?? t;
      atOtherT(estimate.temperatureK);
      const barrierJ = barrierFromRateConstantJ(estimate.k, tData, { molecularity: estimate.molecularity, transmission: ctx.transmission });
      const unit = estimate.molecularity === 1 ? 's⁻¹' : `M⁻${estimate.molecularity === 2 ? '¹' : '²'} s⁻¹`;
      return { barrierJ, detail: `inverse Eyring from k = ${estimate.k} ${unit} at ${tData} K`, findings, approximations };
    }
    case 'halfLife': {
      const tData = estimate.temperatureK ?? t;
      atOtherT(estimate.temperatureK);
      return { barrierJ: barrierFromHalfLifeJ(estimate.seconds, tData, ctx.transmission), detail: `inverse Eyring from a first-order half-life of ${estimate.seconds} s at ${tData} K`, findings, approximations };
    }
    case 'eyringFit': {
      const fit = eyringFit(estimate.data, { transmission: ctx.transmission });
      if (!fit.ok) return { error: `Eyring plot: ${fit.message}` };
      const { dHJ, dSJK, dHSE, dSSE } = fit.value;
      const se = dHSE === null ? '' : ` (±${kcal(dHSE)}, ±${(dSSE! / 4.184).toFixed(2)} cal mol⁻¹ K⁻¹)`;
      const barrierJ = ctx.quantity === 'G' ? dHJ - t * dSJK : dHJ;
      return { barrierJ, detail: `Eyring plot of ${estimate.data.length} points: Δ‡H = ${kcal(dHJ)}, Δ‡S = ${(dSJK / 4.184).toFixed(2)} cal mol⁻¹ K⁻¹${se}`, findings, approximations };
    }
    case 'arrhenius': {
      const fit = arrheniusFit(estimate.data);
      if (!fit.ok) return { error: fit.message };
      const { eaJ, lnA } = fit.value;
      // Δ‡H = E_a − RT (solution or unimolecular; Laidler, Chemical Kinetics, 1987, from memory);
      // Δ‡G from k(T) = A exp(−E_a/RT) through the inverse Eyring equation.
      const lnK = lnA - eaJ / rtJoules(t);
      const barrierJ = ctx.quantity === 'G' ? barrierFromRateConstantJ(Math.exp(lnK), t, { transmission: ctx.transmission }) : eaJ - rtJoules(t);
      return { barrierJ, detail: `Arrhenius fit of ${estimate.data.length} points: E_a = ${kcal(eaJ)}, ln A = ${lnA.toFixed(3)}`, findings, approximations };
    }
  }
}

/**
 * A transition state whose energy is estimated: barrier above the previous minimum by
 * Marcus, Bell–Evans–Polanyi, inverse Eyring (rate constant or half-life), an Eyring plot
 * or an Arrhenius fit. E and H profiles use Δ‡H where the method gives it.
 */
export function resolveEstimate(estimate: Estimate, kind: PointKind, input: EstimateInput): RawPoint & { findings: Finding[] } {
  const { where, before } = input;
  const fail = (code: string, message: string) => ({
    raw: { valueJ: null, scale: before?.raw.scale ?? 'relative' } as RawEnergy,
    provenance: { route: 'missing' as const, detail: message, approximations: [] },
    findings: [{ severity: 'error' as const, code, ...where, message }],
  });
  if (kind !== 'ts') return fail('estimate-on-minimum', 'a barrier estimate belongs to a transition state, not a minimum');
  if (!before) return fail('no-previous-minimum', 'a barrier estimate needs a minimum before the transition state');
  const outcome = evaluate(estimate, input);
  if ('error' in outcome) return fail(outcome.code ?? 'estimate-failed', outcome.error);
  const valueJ = before.raw.valueJ === null ? null : before.raw.valueJ + outcome.barrierJ;
  if (outcome.barrierJ <= 0) outcome.findings.push({ severity: 'warning', code: 'nonpositive-barrier', ...where, message: `the estimated barrier is ${kcal(outcome.barrierJ)}` });
  return {
    raw: { valueJ, scale: before.raw.scale },
    provenance: { route: 'estimate', detail: `${outcome.detail}; barrier above ${before.label}`, approximations: outcome.approximations },
    findings: outcome.findings,
  };
}
