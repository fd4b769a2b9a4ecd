import type { Document } from '../model/schema.ts';
import { conformerPopulations } from '../profile/conformerPopulations.ts';
import { drawInputs } from './inputDraws.ts';
import { perturbDocument } from './perturbDocument.ts';
import { summarise, type Interval } from './summarise.ts';

/** The Boltzmann share of each conformer of one species over the samples (fractions, 0–1). */
export interface ConformerIntervals {
  species: string;
  samples: number;
  seed: number;
  /** One per conformer, in table order; null where no sample gave a population. */
  populations: (Interval | null)[];
  /** The σ that move this species' conformers against each other (labels as `uncertainInputs` gives them). */
  inputs: string[];
}

/**
 * Monte Carlo of one species' conformer populations: the same draws as the analysis
 * (`drawInputs`, so one seed gives the same conformer errors everywhere), applied to that
 * species' own structure inputs only — a σ on the species as a whole shifts every conformer
 * alike and leaves the populations as they are — and weighted by `conformerPopulations`, the
 * function the table shows and the profile resolves with.
 */
export function startConformerUncertainty(doc: Document, speciesId: string, options: { samples?: number; seed?: number } = {}) {
  const draws = drawInputs(doc, options);
  const si = doc.species.findIndex((s) => s.id === speciesId);
  const own = draws.inputs.map((input, i) => ({ input, i })).filter(({ input }) => input.target.kind === 'structure' && input.target.species === si);
  const inputs = own.map((o) => o.input);
  const count = si < 0 ? 0 : doc.species[si]!.structures.length;
  const values = Array.from({ length: count }, () => new Float64Array(draws.total));
  const deltas = new Float64Array(own.length);
  const m = draws.inputs.length;
  let done = 0;
  return {
    total: draws.total,
    get done() { return done; },
    step(n: number) {
      const end = Math.min(draws.total, done + Math.max(0, Math.floor(n)));
      for (let s = done; s < end; s++) {
        draws.ensure(s);
        own.forEach(({ input, i }, k) => { deltas[k] = draws.z[s * m + i]! * input.sigma; });
        const species = perturbDocument(doc, inputs, deltas).species[si];
        const p = species ? conformerPopulations(species, doc.settings) : null;
        for (let c = 0; c < count; c++) values[c]![s] = p?.ok ? p.populations[c]! : Number.NaN;
      }
      done = end;
    },
    result(): ConformerIntervals {
      const scratch = new Float64Array(done);
      return { species: speciesId, samples: done, seed: draws.seed, populations: values.map((v) => summarise(v.subarray(0, done), scratch)), inputs: inputs.map((i) => i.label) };
    },
  };
}
