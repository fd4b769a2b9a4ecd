import type { EnergySpec, Quantity } from '../model/schema.ts';
import { toJoulesPerMol, unitLabel } from '../units/energy.ts';
import type { Finding, Provenance } from './types.ts';
import type { RawEnergy } from './scale.ts';

type TypedSpec = Extract<EnergySpec, { mode: 'value' | 'step' | 'barrier' }>;

/** Context for a typed value: the previous minimum's raw energy, for steps and barriers. */
export interface TypedContext {
  quantity: Quantity;
  previousMinimum: { raw: RawEnergy; label: string } | null;
  where: { pathway: string; point: string };
}

/** Resolves a typed relative value, a step from the previous minimum or a barrier above it. */
export function resolveTyped(spec: TypedSpec, ctx: TypedContext): { raw: RawEnergy; provenance: Provenance; findings: Finding[] } {
  const findings: Finding[] = [];
  const typedJ = toJoulesPerMol(spec.value, spec.unit);
  const shown = `${spec.value} ${unitLabel(spec.unit)}`;
  if (spec.quantity && spec.quantity !== ctx.quantity) {
    findings.push({
      severity: 'warning', code: 'mixed-quantities', ...ctx.where,
      message: `this value is given as ${spec.quantity} but the profile is in ${ctx.quantity}; it is used as it is`,
    });
  }
  if (spec.mode === 'value') {
    return { raw: { valueJ: typedJ, scale: 'relative' }, provenance: { route: 'typed', detail: `typed relative value ${shown}`, approximations: [] }, findings };
  }
  const prev = ctx.previousMinimum;
  const what = spec.mode === 'step' ? 'step energy' : 'barrier';
  if (!prev) {
    findings.push({ severity: 'error', code: 'no-previous-minimum', ...ctx.where, message: `a ${what} needs a minimum before this point` });
    return { raw: { valueJ: null, scale: 'relative' }, provenance: { route: 'missing', detail: `${what} ${shown} with no previous minimum`, approximations: [] }, findings };
  }
  if (spec.mode === 'barrier' && spec.value <= 0) {
    findings.push({ severity: 'warning', code: 'nonpositive-barrier', ...ctx.where, message: `the barrier typed here is ${shown}; a barrier is normally positive` });
  }
  const valueJ = prev.raw.valueJ === null ? null : prev.raw.valueJ + typedJ;
  return {
    raw: { valueJ, scale: prev.raw.scale },
    provenance: { route: spec.mode, detail: `${what} ${shown} from ${prev.label}`, approximations: [] },
    findings,
  };
}
