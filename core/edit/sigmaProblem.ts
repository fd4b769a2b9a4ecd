import { convertEnergy, type EnergyUnit } from '../units/energy.ts';
import { outsideHard } from '../model/bounds.ts';

/**
 * Why `sigma`, a standard uncertainty written in `unit`, cannot be entered (negative, or
 * outside the `uncertaintyKJ` bound of core/model/bounds.ts), or null when it can. `what`,
 * when given, names the field first ("σ E: …").
 */
export function sigmaProblem(sigma: number, unit: EnergyUnit, what?: string): string | null {
  const lead = what ? `${what}: ` : '';
  if (!(sigma >= 0)) return `${lead}expected a standard uncertainty ≥ 0, got ${sigma}`;
  const problem = outsideHard('uncertaintyKJ', convertEnergy(sigma, unit, 'kJ/mol'));
  return problem ? `${lead}${problem}` : null;
}
