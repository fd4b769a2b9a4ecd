import { resolveProfile } from '../profile/resolve.ts';
import { analyseDocument } from '../analysis/analyseDocument.ts';
import { speciesNetwork, type SpeciesRoles } from '../analysis/speciesNetwork.ts';
import { speciesProgress } from '../analysis/speciesProgress.ts';
import type { MassActionNetwork } from '../kinetics/microkinetics/network.ts';
import type { Finding, ResolvedPathway } from '../profile/types.ts';
import type { Document } from '../model/schema.ts';
import { networkFromPathway } from '../kinetics/microkinetics/networkFromPathway.ts';
import { simulate } from '../kinetics/microkinetics/simulate.ts';
import { energeticSpan } from '../kinetics/energeticSpan.ts';
import { tableToCsv } from '../export/tableToCsv.ts';
import { CliError, EXIT_USAGE, type CliIo } from './io.ts';
import { significant } from './significant.ts';
import { loadInput } from './loadInput.ts';
import { applySettingOptions, boundedOption } from './options.ts';
import { outsideHard } from '../model/bounds.ts';
import { timedProgress } from './largeWork.ts';

export interface SimulateCliOptions {
  species?: boolean | undefined;
  until?: string | undefined;
  points?: string | undefined;
  init?: string[] | undefined;
  pathway?: string | undefined;
  temperature?: string | undefined;
}

/** `LABEL=CONC` pairs -> concentrations keyed by label. */
function readInitial(pairs: readonly string[]): Map<string, number> {
  const initial = new Map<string, number>();
  for (const pair of pairs) {
    const at = pair.lastIndexOf('=');
    const text = pair.slice(at + 1).trim();
    const value = text === '' ? Number.NaN : Number(text);
    if (at <= 0 || Number.isNaN(value)) throw new CliError(`--init: expected LABEL=CONCENTRATION (mol/L, ≥ 0), got "${pair}"`, EXIT_USAGE);
    const problem = outsideHard('concentration', value);
    if (problem) throw new CliError(`--init ${pair.slice(0, at)}: ${problem}`, EXIT_USAGE);
    initial.set(pair.slice(0, at), value);
  }
  return initial;
}

/**
 * `passline simulate FILE`: microkinetic simulation of one pathway as a first-order chain of
 * its minima (a cycle returns to its first state). Prints CSV of concentrations (mol/L) vs
 * time (s) and, for a cycle at steady state, the TOF.
 */
export function runSimulate(file: string, options: SimulateCliOptions, io: CliIo): void {
  const doc = applySettingOptions(loadInput(file, io), { temperature: options.temperature });
  const until = boundedOption('until', options.until, 'timeSeconds', 3600);
  const points = boundedOption('points', options.points, 'simulationPoints', 50, true);
  const chosen = options.species ? fromSpecies(doc) : fromPathway(doc, options.pathway);
  const { network, findings, pathway, roles } = chosen;
  const states = outsideHard('simulationStates', network.species.length);
  if (states) throw new CliError(`${states}: simulate a shorter pathway or fewer species (the stiff solver's work grows quickly with the number of states)`);
  const what = pathway ? `a minimum of "${pathway.name}"` : 'a species of the document';
  const byLabel = readInitial(options.init ?? []);
  const initial: Record<string, number> = {};
  for (const [label, value] of byLabel) {
    const index = network.labels.indexOf(label) >= 0 ? network.labels.indexOf(label) : network.species.indexOf(label);
    if (index < 0) throw new CliError(`--init: "${label}" is not ${what} (have ${network.labels.map((l) => `"${l}"`).join(', ')})`, EXIT_USAGE);
    initial[network.species[index]!] = value;
  }
  if (byLabel.size === 0) {
    if (options.species) throw new CliError('--species: give starting concentrations with --init LABEL=CONC', EXIT_USAGE);
    initial[network.species[0]!] = 1;
  }
  // The solver stops at every output time, so its step budget grows with the rows asked for.
  const onProgress = timedProgress('simulate', io, 'the output times');
  const outcome = simulate(network, initial, { until, points, maxSteps: 100_000 + 4 * points, onProgress });
  if (!outcome.ok) throw new CliError(outcome.errors.map((e) => `${e.path}: ${e.message}`).join('; '));
  const s = outcome.simulation;
  // Species mode reads progress from the overall roles; a pathway chain, from its first minimum.
  const progress = roles ? speciesProgress(s, roles) : [];
  const extra = progress.length > 0 ? progress : [{ name: options.species ? `conversion of ${s.labels[s.species.indexOf(s.reference)]}` : 'conversion', values: s.conversion }];
  io.out(tableToCsv({
    columns: ['time [s]', ...s.labels.map((l) => `${l} [mol/L]`), ...extra.map((e) => e.name)],
    rows: s.times.map((t, k) => [t, ...s.concentrations[k]!, ...extra.map((e) => e.values[k]!)].map(significant)),
  }));
  for (const f of [...findings, ...s.findings]) io.err(`${f.severity}: ${f.message}\n`);
  if (s.steadyStateTof !== undefined) io.err(`steady-state TOF (simulated): ${s.steadyStateTof.toPrecision(6)} s⁻¹\n`);
  if (pathway?.cycle) {
    const { span } = energeticSpan(pathway, { temperatureK: doc.settings.temperatureK, transmission: doc.settings.transmission });
    if (span) io.err(`TOF (energetic span model, exact): ${span.tof.toPrecision(6)} s⁻¹\n`);
  }
}

interface ChosenNetwork { network: MassActionNetwork; findings: Finding[]; pathway: ResolvedPathway | null; roles: SpeciesRoles | null }

/** The document's species as a mass-action network (states need compositions). */
function fromSpecies(doc: Document): ChosenNetwork {
  const built = speciesNetwork(doc, analyseDocument(doc));
  if (!built.network) throw new CliError(built.findings.map((f) => f.message).join('; '));
  return { network: built.network, findings: built.findings, pathway: null, roles: built.roles };
}

/** One pathway as a first-order chain of its minima. */
function fromPathway(doc: Document, name: string | undefined): ChosenNetwork {
  const profile = resolveProfile(doc);
  const pathway = name === undefined
    ? profile.pathways.find((p) => p.cycle) ?? profile.pathways[0]
    : profile.pathways.find((p) => p.id === name || p.name === name);
  if (!pathway) throw new CliError(name === undefined ? 'the document has no pathways' : `--pathway: no pathway "${name}" (have ${profile.pathways.map((p) => `"${p.name}"`).join(', ')})`, name === undefined ? 1 : EXIT_USAGE);
  const built = networkFromPathway(pathway, { temperatureK: doc.settings.temperatureK, transmission: doc.settings.transmission });
  if (!built.ok) throw new CliError(built.errors.map((e) => e.message).join('; '));
  return { network: built.network, findings: built.findings, pathway, roles: null };
}
