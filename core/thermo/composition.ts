/** Element counts and net charge of a species or a sum of species. */
export interface Composition {
  /** Element symbol -> number of atoms (fractional only for non-stoichiometric input). */
  counts: Readonly<Record<string, number>>;
  /** Net charge in units of the elementary charge. */
  charge: number;
}

/** One element's difference between two compositions (a − b). */
export interface ElementDifference {
  element: string;
  difference: number;
}

/** Result of {@link compareCompositions}: what `a` has more of than `b`. */
export interface CompositionComparison {
  /** True when every element and the charge agree (within 1e-9). */
  equal: boolean;
  /** Non-zero differences a − b, in Hill order (C, H, then alphabetical). */
  differences: ElementDifference[];
  /** charge(a) − charge(b). */
  chargeDifference: number;
}

const TOLERANCE = 1e-9;

/** Sums species compositions weighted by their counts (e.g. a state of several species). */
export function sumCompositions(terms: readonly { formula: Composition; count: number }[]): Composition {
  const counts: Record<string, number> = {};
  let charge = 0;
  for (const { formula, count } of terms) {
    for (const [element, n] of Object.entries(formula.counts)) counts[element] = (counts[element] ?? 0) + n * count;
    charge += formula.charge * count;
  }
  return { counts, charge };
}

/** Elements in Hill order: C first, then H, then alphabetical (Hill, JACS 22, 478 (1900)). */
export function hillOrder(elements: Iterable<string>): string[] {
  const list = [...new Set(elements)];
  const rank = (e: string): number => (e === 'C' ? 0 : e === 'H' ? 1 : 2);
  return list.sort((x, y) => rank(x) - rank(y) || (x < y ? -1 : x > y ? 1 : 0));
}

/** Per-element and charge differences a − b (used for mass-balance findings). */
export function compareCompositions(a: Composition, b: Composition): CompositionComparison {
  const differences: ElementDifference[] = [];
  for (const element of hillOrder([...Object.keys(a.counts), ...Object.keys(b.counts)])) {
    const difference = (a.counts[element] ?? 0) - (b.counts[element] ?? 0);
    if (Math.abs(difference) > TOLERANCE) differences.push({ element, difference });
  }
  const chargeDifference = a.charge - b.charge;
  const chargeEqual = Math.abs(chargeDifference) <= TOLERANCE;
  return { equal: differences.length === 0 && chargeEqual, differences, chargeDifference: chargeEqual ? 0 : chargeDifference };
}

function amount(x: number): string {
  return String(Number(Math.abs(x).toPrecision(12)));
}

/**
 * Words for a comparison, e.g. "2 more H, 1 fewer O, charge 1 higher"; empty when equal.
 * Callers add the subject: `state X has ${text} than the reference`.
 */
export function describeComparison(comparison: CompositionComparison): string {
  const parts = comparison.differences.map(
    ({ element, difference }) => `${amount(difference)} ${difference > 0 ? 'more' : 'fewer'} ${element}`,
  );
  if (comparison.chargeDifference !== 0) {
    parts.push(`charge ${amount(comparison.chargeDifference)} ${comparison.chargeDifference > 0 ? 'higher' : 'lower'}`);
  }
  return parts.join(', ');
}
