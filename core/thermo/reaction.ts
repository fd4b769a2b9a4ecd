/** One species with its stoichiometric coefficient (always positive here). */
export interface ReactionTerm {
  /** Species name as written, formula plus phase, e.g. "H2O(l)". */
  species: string;
  coefficient: number;
}

/** A parsed reaction: left side → right side. */
export interface Reaction {
  reactants: ReactionTerm[];
  products: ReactionTerm[];
}

/** Result of {@link parseReaction}. */
export type ReactionResult = { ok: true; value: Reaction } | { ok: false; message: string };

const ARROW = /<=>|<->|⇌|⇄|↔|->|→|=>|=/g;
const COEFFICIENT = /^(\d+\/\d+|\d*\.\d+|\d+)\s*/;

function parseCoefficient(text: string): number {
  const [num, den] = text.split('/');
  return den === undefined ? Number(num) : Number(num) / Number(den);
}

function parseSide(text: string, side: string): { ok: true; terms: ReactionTerm[] } | { ok: false; message: string } {
  const terms: ReactionTerm[] = [];
  const pieces = text.trim().split(/\s+\+(?=\s|$)/);
  for (const raw of pieces) {
    const piece = raw.trim();
    if (piece === '' || piece === '+') return { ok: false, message: `empty species on the ${side} side (separate species with ' + ')` };
    const m = COEFFICIENT.exec(piece);
    const coefficient = m ? parseCoefficient(m[1] ?? '') : 1;
    const species = m ? piece.slice(m[0].length) : piece;
    if (species === '') return { ok: false, message: `coefficient '${piece}' has no species after it (${side} side)` };
    if (!(coefficient > 0) || !Number.isFinite(coefficient)) return { ok: false, message: `bad coefficient '${m?.[1]}' before ${species}` };
    if (/\s/.test(species)) return { ok: false, message: `'${species}' contains a space: separate species with ' + ' and write charges as ^2-` };
    terms.push({ species, coefficient });
  }
  return { ok: true, terms };
}

/**
 * Parses a reaction such as `CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)`. Arrows: `->`, `→`, `=>`,
 * `=`, `<=>`, `⇌`; coefficients as integers, decimals (`0.5`) or fractions (`1/2`); species are
 * separated by ` + ` with spaces, so charges (`NH4^+`) stay with their species.
 */
export function parseReaction(text: string): ReactionResult {
  const arrows = [...text.matchAll(ARROW)];
  if (arrows.length === 0) return { ok: false, message: `no arrow in '${text.trim()}' (write -> or = between the sides)` };
  if (arrows.length > 1) return { ok: false, message: `more than one arrow in '${text.trim()}'` };
  const arrow = arrows[0];
  if (arrow === undefined) throw new Error('unreachable');
  const left = text.slice(0, arrow.index).trim();
  const right = text.slice(arrow.index + arrow[0].length).trim();
  if (left === '') return { ok: false, message: 'nothing on the left of the arrow' };
  if (right === '') return { ok: false, message: 'nothing on the right of the arrow' };
  const reactants = parseSide(left, 'left');
  if (!reactants.ok) return reactants;
  const products = parseSide(right, 'right');
  if (!products.ok) return products;
  return { ok: true, value: { reactants: reactants.terms, products: products.terms } };
}

/** Net stoichiometric numbers ν per species (products positive, reactants negative). */
export function netStoichiometry(reaction: Reaction): Map<string, number> {
  const nu = new Map<string, number>();
  for (const t of reaction.reactants) nu.set(t.species, (nu.get(t.species) ?? 0) - t.coefficient);
  for (const t of reaction.products) nu.set(t.species, (nu.get(t.species) ?? 0) + t.coefficient);
  return nu;
}
