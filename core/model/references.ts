import type { Document } from './schema.ts';
import type { DocumentError } from './load.ts';

function duplicates(ids: readonly string[]): Set<string> {
  const seen = new Set<string>();
  const dupes = new Set<string>();
  for (const id of ids) (seen.has(id) ? dupes : seen).add(id);
  return dupes;
}

/** Cross-field rules a schema cannot state: unique ids and references that resolve. */
export function referenceProblems(doc: Document): DocumentError[] {
  const errors: DocumentError[] = [];
  const speciesIds = new Set(doc.species.map((s) => s.id));
  for (const id of duplicates(doc.species.map((s) => s.id))) {
    errors.push({ path: 'species', message: `species id "${id}" is used more than once` });
  }
  for (const id of duplicates(doc.pathways.map((p) => p.id))) {
    errors.push({ path: 'pathways', message: `pathway id "${id}" is used more than once` });
  }
  doc.pathways.forEach((pathway, i) => {
    for (const id of duplicates(pathway.points.map((p) => p.id))) {
      errors.push({ path: `pathways[${i}].points`, message: `point id "${id}" is used more than once in pathway "${pathway.name}"` });
    }
    pathway.points.forEach((point, j) => {
      const energy = point.energy;
      const lists: [string, { species: string }[] | undefined][] = [
        ['energy.terms', energy.mode === 'species' || energy.mode === 'formation' ? energy.terms : undefined],
        ['composition', point.composition],
      ];
      for (const [field, terms] of lists) {
        terms?.forEach((term, k) => {
          if (!speciesIds.has(term.species)) {
            errors.push({ path: `pathways[${i}].points[${j}].${field}[${k}].species`, message: `no species with id "${term.species}"` });
          }
        });
      }
    });
  });
  const pathwayIds = new Set(doc.pathways.map((p) => p.id));
  doc.comparisons.forEach((c, i) => {
    const ids = c.type === 'rate' ? { baseline: c.baseline, candidate: c.candidate } : Object.fromEntries(c.pathways.map((id, k) => [`pathways[${k}]`, id]));
    for (const [field, id] of Object.entries(ids)) {
      if (!pathwayIds.has(id)) errors.push({ path: `comparisons[${i}].${field}`, message: `no pathway with id "${id}"` });
    }
  });
  const ref = doc.settings.reference;
  if (ref.kind === 'species') ref.terms.forEach((t, k) => {
    if (!speciesIds.has(t.species)) errors.push({ path: `settings.reference.terms[${k}].species`, message: `no species with id "${t.species}"` });
  });
  doc.pathways.forEach((pathway, i) => {
    const b = pathway.branch;
    const from = b && doc.pathways.find((p) => p.id === b.pathway);
    if (b && !from) errors.push({ path: `pathways[${i}].branch.pathway`, message: `no pathway with id "${b.pathway}"` });
    else if (b && from && !from.points.some((p) => p.id === b.point)) errors.push({ path: `pathways[${i}].branch.point`, message: `no point with id "${b.point}" in pathway "${from.name}"` });
  });
  if (ref.kind === 'point') {
    const pathway = doc.pathways.find((p) => p.id === ref.pathway);
    if (!pathway) errors.push({ path: 'settings.reference.pathway', message: `no pathway with id "${ref.pathway}"` });
    else if (!pathway.points.some((p) => p.id === ref.point)) {
      errors.push({ path: 'settings.reference.point', message: `no point with id "${ref.point}" in pathway "${pathway.name}"` });
    }
  }
  return errors;
}
