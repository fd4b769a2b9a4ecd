import { pointComposition } from '../../model/composition.ts';
import type { Document, Point, Species, Structure } from '../../model/schema.ts';
import type { Finding } from '../types.ts';
import type { CheckInput } from './checkContext.ts';

/** Imaginary modes on a minimum smaller than this are a warning, larger an error (common practice: ~50 cm⁻¹ is numerical noise). */
export const SMALL_IMAGINARY_CM1 = 50;

const filesOf = (s: Structure, roles: readonly string[]) => (s.source?.files ?? []).filter((f) => roles.includes(f.role)).map((f) => f.file);
const CORRECTION_ROLES = ['corrections', 'energy+corrections'];
const ENERGY_ROLES = ['energy', 'energy+corrections'];
const nameOf = (sp: Species, s: Structure, roles = CORRECTION_ROLES) => filesOf(s, roles)[0] ?? sp.label;
const normalMethod = (m: string) => m.toLowerCase().split(/[\s/]+/).filter(Boolean).sort().join(' ');

function statesOf(doc: Document): { pathway: string; point: Point; species: { sp: Species; count: number }[] }[] {
  const byId = new Map(doc.species.map((s) => [s.id, s]));
  return doc.pathways.flatMap((pathway) => pathway.points.map((point) => ({
    pathway: pathway.id, point,
    species: (point.energy.mode === 'species' ? point.energy.terms : pointComposition(point) ?? [])
      .flatMap((t) => (byId.has(t.species) ? [{ sp: byId.get(t.species)!, count: t.count }] : [])),
  })));
}

function stationaryPoints(states: ReturnType<typeof statesOf>): Finding[] {
  const findings: Finding[] = [];
  for (const { pathway, point, species } of states) {
    if (point.energy.mode !== 'species') continue;
    const where = { pathway, point: point.id };
    const withModes = species.flatMap(({ sp, count }) => sp.structures.filter((s) => s.frequencies).map((s) => ({ sp, s, count, imag: s.frequencies!.filter((f) => f < 0) })));
    const complete = withModes.length > 0 && species.every(({ sp }) => sp.structures.every((s) => s.frequencies));
    const list = (items: typeof withModes) => items.map(({ sp, s, imag }) => `${nameOf(sp, s)} (${imag.map((f) => `${Math.abs(f).toFixed(0)}i`).join(', ') || 'none'})`).join('; ');
    if (point.kind === 'ts') {
      const perTs = species.map(({ sp }) => Math.max(0, ...sp.structures.filter((s) => s.frequencies).map((s) => s.frequencies!.filter((f) => f < 0).length)));
      const total = perTs.reduce((sum, n, i) => sum + n * species[i]!.count, 0);
      if (total > 1 || (complete && total === 0)) {
        findings.push({ severity: 'error', code: 'ts-imaginary-count', ...where, message: `transition state "${point.label}" has ${total} imaginary frequencies, expected exactly 1: ${list(withModes)}` });
      }
      continue;
    }
    const bad = withModes.filter((m) => m.imag.length > 0);
    if (bad.length === 0) continue;
    const large = bad.some((m) => m.imag.some((f) => -f >= SMALL_IMAGINARY_CM1));
    findings.push(large
      ? { severity: 'error', code: 'minimum-imaginary', ...where, message: `minimum "${point.label}" has imaginary frequencies: ${list(bad)}` }
      : { severity: 'warning', code: 'minimum-small-imaginary', ...where, message: `minimum "${point.label}" has small imaginary frequencies (below ${SMALL_IMAGINARY_CM1} cm⁻¹, often numerical noise; common practice is to tighten and re-run): ${list(bad)}` });
  }
  return findings;
}

function runHealth(used: Species[]): Finding[] {
  const findings: Finding[] = [];
  const seen = new Set<string>();
  for (const sp of used) for (const s of sp.structures) for (const f of s.source?.files ?? []) {
    if (seen.has(`${f.file}\n${f.termination}\n${f.optimisation}`)) continue;
    seen.add(`${f.file}\n${f.termination}\n${f.optimisation}`);
    if (f.optimisation === 'not-converged') findings.push({ severity: 'error', code: 'optimisation-not-converged', message: `${f.file} (species "${sp.label}"): the geometry optimisation did not converge` });
    if (f.termination === 'abnormal') findings.push({ severity: 'error', code: 'abnormal-termination', message: `${f.file} (species "${sp.label}"): the run ended with an error` });
    if (f.termination === 'truncated') findings.push({ severity: 'warning', code: 'truncated-output', message: `${f.file} (species "${sp.label}"): the output ends before the program's termination line` });
  }
  return findings;
}

function chargeAndSpin(doc: Document, states: ReturnType<typeof statesOf>): Finding[] {
  const findings: Finding[] = [];
  const total = (sts: { sp: Species; count: number }[], get: (sp: Species) => number | undefined) =>
    sts.length > 0 && sts.every(({ sp }) => get(sp) !== undefined && sp.structures.some((s) => s.source)) ? sts.reduce((sum, { sp, count }) => sum + count * get(sp)!, 0) : null;
  const files = (sts: { sp: Species }[]) => sts.map(({ sp }) => sp.structures[0] ? nameOf(sp, sp.structures[0], ENERGY_ROLES) : sp.label).join(', ');
  for (const pathway of doc.pathways) {
    const mine = states.filter((s) => s.pathway === pathway.id);
    for (let i = 1; i < mine.length; i++) {
      const a = mine[i - 1]!, b = mine[i]!;
      const where = { pathway: pathway.id, point: b.point.id };
      const qa = total(a.species, (sp) => sp.charge), qb = total(b.species, (sp) => sp.charge);
      if (qa !== null && qb !== null && qa !== qb) {
        findings.push({ severity: 'error', code: 'charge-changes', ...where, message: `total charge changes from ${qa} at "${a.point.label}" (${files(a.species)}) to ${qb} at "${b.point.label}" (${files(b.species)})` });
      }
      const unpaired = (sp: Species) => (sp.multiplicity === undefined ? undefined : sp.multiplicity - 1);
      const sa = total(a.species, unpaired), sb = total(b.species, unpaired);
      if (sa !== null && sb !== null && sa !== sb) {
        findings.push({ severity: 'warning', code: 'multiplicity-changes', ...where, message: `spin changes between "${a.point.label}" (${files(a.species)}, ${sa} unpaired electrons) and "${b.point.label}" (${files(b.species)}, ${sb}); intended only for a spin crossover` });
      }
    }
  }
  return findings;
}

function mixed(used: Species[], roles: readonly string[], what: string, code: string): Finding[] {
  const groups = new Map<string, { method: string; files: string[] }>();
  for (const sp of used) for (const s of sp.structures) for (const f of s.source?.files ?? []) {
    if (!roles.includes(f.role) || !f.method) continue;
    const key = normalMethod(f.method);
    const g = groups.get(key) ?? { method: f.method, files: [] };
    if (!g.files.includes(f.file)) g.files.push(f.file);
    groups.set(key, g);
  }
  if (groups.size < 2) return [];
  return [{ severity: 'warning', code, message: `${what} come from ${groups.size} different methods or basis sets: ${[...groups.values()].map((g) => `${g.method} (${g.files.join(', ')})`).join('; ')}` }];
}

function temperatures(used: Species[]): Finding[] {
  const groups = new Map<number, string[]>();
  for (const sp of used) {
    if (sp.correctionTemperatureK === undefined || !sp.structures.some((s) => s.hCorrection !== undefined || s.gCorrection !== undefined)) continue;
    const names = sp.structures.map((s) => nameOf(sp, s));
    groups.set(sp.correctionTemperatureK, [...(groups.get(sp.correctionTemperatureK) ?? []), ...names]);
  }
  if (groups.size < 2) return [];
  return [{ severity: 'warning', code: 'mixed-temperatures', message: `thermal corrections are at ${groups.size} different temperatures: ${[...groups].map(([t, names]) => `${t} K (${names.join(', ')})`).join('; ')}` }];
}

/**
 * Findings about stationary points read from calculation outputs: a TS needs exactly one
 * imaginary frequency and a minimum none (small ones a warning); non-converged
 * optimisations, runs that ended with an error or early; charge or spin that changes
 * between the states of one step; mixed methods or basis sets; corrections at different
 * temperatures. Each names the files.
 */
export function checkCalculations({ doc }: CheckInput): Finding[] {
  const states = statesOf(doc);
  const usedIds = new Set(states.flatMap((s) => s.species.map(({ sp }) => sp.id)));
  const used = doc.species.filter((s) => usedIds.has(s.id));
  return [
    ...stationaryPoints(states),
    ...runHealth(used),
    ...chargeAndSpin(doc, states),
    ...mixed(used, ENERGY_ROLES, 'electronic energies', 'mixed-energy-methods'),
    ...mixed(used, CORRECTION_ROLES, 'thermal corrections', 'mixed-correction-methods'),
    ...temperatures(used),
  ];
}
