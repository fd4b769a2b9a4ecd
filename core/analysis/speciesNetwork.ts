import { pointComposition } from '../model/composition.ts';
import type { Document, SpeciesTerm } from '../model/schema.ts';
import type { Finding } from '../profile/types.ts';
import { networkFromReactions, type ReactionInput } from '../kinetics/microkinetics/networkFromReactions.ts';
import type { MassActionNetwork } from '../kinetics/microkinetics/network.ts';
import type { DocumentAnalysis } from './analyseDocument.ts';

type Counts = Record<string, number>;

function counts(terms: readonly SpeciesTerm[]): Counts {
  const out: Counts = {};
  for (const t of terms) out[t.species] = (out[t.species] ?? 0) + t.count;
  return out;
}

/** Molecules of `a` not matched in `b` (spectators cancel). */
function minus(a: Counts, b: Counts): Counts {
  const out: Counts = {};
  for (const [s, n] of Object.entries(a)) if (n - (b[s] ?? 0) > 0) out[s] = n - (b[s] ?? 0);
  return out;
}

/**
 * Overall roles of the network's species, read from the first and last minimum of each
 * pathway: what is consumed overall (substrates, with stoichiometry), what is formed overall
 * (products), and what is there in equal amount at both ends and takes part in a step (the
 * catalyst the cycle regenerates). Pathways are merged; the first pathway's stoichiometry wins.
 */
export interface SpeciesRoles {
  substrates: Counts;
  products: Counts;
  catalyst: string[];
}

const key = (c: Counts) => Object.entries(c).sort(([x], [y]) => (x < y ? -1 : 1)).map(([s, n]) => `${n}${s}`).join('+');

/**
 * Mass-action network of the document's species: every step between two minima whose
 * compositions are known becomes an elementary reaction (spectator species cancel), with the
 * Eyring constants of the analysis — molecularity from the compositions, reverse constants
 * by detailed balance. The same reaction met in two pathways is kept once. Pathways without
 * compositions are left out, with a finding.
 */
export function speciesNetwork(doc: Document, analysis: DocumentAnalysis): { network: MassActionNetwork | null; roles: SpeciesRoles | null; findings: Finding[] } {
  const findings: Finding[] = [];
  const ends: [Counts, Counts][] = [];
  const reactions: ReactionInput[] = [];
  const seen = new Set<string>();
  analysis.pathways.forEach(({ steps }, i) => {
    const pathway = doc.pathways[i]!;
    const byId = new Map(pathway.points.map((p) => [p.id, pointComposition(p)] as const));
    if (pathway.points.some((p) => p.kind === 'min' && !byId.get(p.id))) {
      findings.push({ severity: 'info', code: 'network-needs-compositions', pathway: pathway.id, message: `"${pathway.name}" is left out of the species network: not every minimum has a composition` });
      return;
    }
    const minima = pathway.points.filter((p) => p.kind === 'min');
    if (minima.length >= 2) ends.push([counts(byId.get(minima[0]!.id)!), counts(byId.get(minima.at(-1)!.id)!)]);
    for (const step of steps) {
      const a = counts(byId.get(step.from.id)!), b = counts(byId.get(step.to.id)!);
      const reactants = minus(a, b), products = minus(b, a);
      const id = `${key(reactants)}>${key(products)}`;
      if (Object.keys(reactants).length === 0 || seen.has(id) || step.kForward === null) continue;
      seen.add(id);
      reactions.push({ label: `${step.from.label} → ${step.to.label}`, reactants, products, kf: step.kForward, kr: step.kReverse ?? 0 });
    }
  });
  if (reactions.length === 0) return { network: null, roles: null, findings: [...findings, { severity: 'error', code: 'network-empty', message: 'no step with known compositions and energies to build a species network from' }] };
  const built = networkFromReactions(reactions);
  if (!built.ok) return { network: null, roles: null, findings: [...findings, ...built.errors.map((e) => ({ severity: 'error' as const, code: 'network-invalid', message: `${e.path}: ${e.message}` }))] };
  const labelOf = new Map(doc.species.map((s) => [s.id, s.label]));
  const network = { ...built.network, labels: built.network.species.map((s) => labelOf.get(s) ?? s) };
  return { network, roles: speciesRoles(ends, new Set(network.species)), findings };
}

function speciesRoles(ends: readonly [Counts, Counts][], inNetwork: ReadonlySet<string>): SpeciesRoles | null {
  const substrates: Counts = {}, products: Counts = {}, catalyst = new Set<string>();
  const add = (into: Counts, c: Counts) => { for (const [s, n] of Object.entries(c)) if (inNetwork.has(s) && !(s in into)) into[s] = n; };
  for (const [first, last] of ends) {
    add(substrates, minus(first, last));
    add(products, minus(last, first));
    for (const [s, n] of Object.entries(first)) if (last[s] === n && inNetwork.has(s)) catalyst.add(s);
  }
  if (Object.keys(substrates).length === 0 || Object.keys(products).length === 0) return null;
  return { substrates, products, catalyst: [...catalyst] };
}
