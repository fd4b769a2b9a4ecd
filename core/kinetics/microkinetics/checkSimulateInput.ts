import type { MassActionNetwork } from './network.ts';
import type { NetworkError } from './networkFromReactions.ts';
import type { SimulateOptions } from './simulationTypes.ts';

/** Checks initial concentrations and options; returns the errors with their paths (empty when fine). */
export function checkSimulateInput(network: MassActionNetwork, initial: Record<string, number>, options: SimulateOptions): NetworkError[] {
  const errors: NetworkError[] = [];
  for (const [name, value] of Object.entries(initial)) {
    if (!network.species.includes(name)) errors.push({ path: `initial.${name}`, message: `"${name}" is not a species of the network (${network.species.join(', ')})` });
    else if (!Number.isFinite(value) || value < 0) errors.push({ path: `initial.${name}`, message: `initial concentration must be a finite number ≥ 0 mol/L, got ${value}` });
  }
  if (!network.species.some((s) => (initial[s] ?? 0) > 0)) errors.push({ path: 'initial', message: 'every initial concentration is zero; nothing can react' });
  const { until, points = 200, tofWindow = 0.2 } = options;
  if (!(until > 0) || !Number.isFinite(until)) errors.push({ path: 'options.until', message: `end time must be a positive number of seconds, got ${until}` });
  if (!Number.isInteger(points) || points < 2) errors.push({ path: 'options.points', message: `need a whole number of at least 2 time points, got ${points}` });
  if (options.from !== undefined && !(options.from > 0 && options.from < until)) errors.push({ path: 'options.from', message: `first log time must lie between 0 and the end time, got ${options.from}` });
  if (!(tofWindow > 0 && tofWindow < 1)) errors.push({ path: 'options.tofWindow', message: `TOF window must be a fraction in (0, 1), got ${tofWindow}` });
  if (options.reference !== undefined && !((initial[options.reference] ?? 0) > 0)) errors.push({ path: 'options.reference', message: `conversion species "${options.reference}" must be present at t = 0` });
  return errors;
}
