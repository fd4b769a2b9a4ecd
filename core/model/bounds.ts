import { formatScientific } from '../format/formatScientific.ts';

/**
 * The one table of limits for numbers a user can enter (document schema, editor fields and
 * command-line options all read it). `hard` is the range outside which a value is refused
 * as non-physical or unusable; `usual` is the range outside which a value is accepted with a
 * warning. Limits are common practice, chosen so that every value inside `hard` keeps the
 * arithmetic finite (Eyring exponentials, layout in mm); they are not physical constants.
 */
export interface Bound {
  /** What the number is, for messages ("temperature"). */
  readonly what: string;
  /** Unit the limits are written in, for messages ("K"). */
  readonly unit: string;
  readonly hard: readonly [min: number, max: number];
  readonly usual: readonly [min: number, max: number];
}

const bound = (what: string, unit: string, hard: [number, number], usual: [number, number]): Bound =>
  ({ what, unit, hard, usual });

export const BOUNDS = {
  /** Thermodynamic temperature. Eyring and Boltzmann factors need T well above 0 K. */
  temperatureK: bound('temperature', 'K', [1, 10_000], [100, 2_000]),
  /** Relative energy of a point, a step or a barrier, in kJ/mol (any input unit converts). */
  relativeEnergyKJ: bound('relative energy', 'kJ/mol', [-100_000, 100_000], [-2_000, 2_000]),
  /** Absolute electronic energy of a structure. */
  absoluteEnergyHartree: bound('absolute energy', 'hartree', [-1_000_000, 1_000_000], [-100_000, 0]),
  /** Thermal correction (ZPE, H or G correction) of a structure. */
  correctionHartree: bound('thermal correction', 'hartree', [-100, 100], [-1, 5]),
  /** Transmission coefficient κ in the Eyring equation (the issue tracker asks κ ≤ 1). */
  transmission: bound('transmission coefficient', '', [1e-6, 1], [0.01, 1]),
  /** Rate constant (any order), in its own units. */
  rateConstant: bound('rate constant', '(s⁻¹, M⁻¹ s⁻¹, …)', [1e-40, 1e20], [1e-20, 1e13]),
  /** Half-life or a simulated time span. h/(k_B T) ≈ 1.6 × 10⁻¹³ s at 298 K is the fastest step. */
  timeSeconds: bound('time', 's', [1e-15, 1e20], [1e-12, 1e12]),
  /**
   * Standard uncertainty σ of an entered energy, in kJ/mol (any input unit converts; issue 18).
   * Computed relative energies carry 1–3 kcal/mol (4–13 kJ/mol) of method error (common practice).
   */
  uncertaintyKJ: bound('standard uncertainty σ', 'kJ/mol', [0, 10_000], [0, 40]),
  /**
   * σ/value of a rate constant or half-life (issue 18). Such a positive input is sampled
   * log-normally with σ_ln = σ/value, so e^{zσ/value} must stay finite; beyond 1 the
   * first-order reading σ_ln ≈ σ/value is crude (common practice: quote a factor instead).
   */
  relativeSigma: bound('relative uncertainty σ/value', '', [0, 10], [0, 1]),
  /** Marcus reorganisation energy λ, in kJ/mol. */
  reorganisationKJ: bound('reorganisation energy λ', 'kJ/mol', [1e-3, 10_000], [10, 1_000]),
  /** Figure width or height. */
  figureMm: bound('figure size', 'mm', [20, 2_000], [40, 500]),
  /** Any other length on the figure (bar width, structure size). */
  lengthMm: bound('length', 'mm', [0, 500], [0, 100]),
  /** A shift on the figure (label offset), either direction. */
  offsetMm: bound('offset', 'mm', [-500, 500], [-100, 100]),
  /** PNG resolution. */
  dpi: bound('resolution', 'dpi', [36, 2_400], [72, 1_200]),
  /** Font size. */
  fontPt: bound('font size', 'pt', [2, 72], [5, 24]),
  /** Line width. */
  linePt: bound('line width', 'pt', [0.05, 20], [0.2, 4]),
  /** Position of a point along the reaction coordinate (slot units). */
  coordinate: bound('coordinate', '', [-10_000, 10_000], [-1_000, 1_000]),
  /** Species count in a state. */
  count: bound('count', '', [1e-6, 1_000], [1, 100]),
  /** Cut-off of a quasi-harmonic low-mode treatment (100 cm⁻¹ is common practice). */
  lowModeCutoffCm1: bound('quasi-harmonic cut-off', 'cm⁻¹', [1, 1_000], [50, 200]),
  /** Concentration, mol/L. */
  concentration: bound('concentration', 'mol/L', [0, 1e4], [1e-9, 100]),
  /** Net charge of a species or a molecule, in elementary charges. */
  charge: bound('charge', 'e', [-100, 100], [-4, 4]),
  /** Standard molar entropy, J/(mol K); ions in solution may be negative. */
  entropy: bound('entropy', 'J/(mol K)', [-10_000, 10_000], [-500, 2_000]),
  /** Bell–Evans–Polanyi slope α (dimensionless; usually between 0 and 1). */
  bepSlope: bound('Bell–Evans–Polanyi slope α', '', [-10, 10], [0, 1]),
  /** Points in one document, over all pathways: beyond this layout and analysis stop being interactive. */
  pointCount: bound('number of points', '', [0, 5_000], [0, 500]),
  /** Characters in one label, name or annotation text. */
  textLength: bound('text length', 'characters', [0, 1_000], [0, 80]),
  /** Output rows of a simulation (`simulate --points`). */
  simulationPoints: bound('number of output times', '', [2, 10_000], [10, 1_000]),
  /** States (species) in one microkinetic simulation: the stiff solver's work grows with their number. */
  simulationStates: bound('number of states in a simulation', '', [1, 100], [1, 30]),
  /** Temperatures in a scan (`scan --count`). */
  scanCount: bound('number of temperatures', '', [1, 1_000], [2, 100]),
} as const satisfies Record<string, Bound>;

export type BoundName = keyof typeof BOUNDS;

/**
 * A limit for a message in the app's notation: exact and plain from 0.001 to below a million
 * ("10000", "−23900.6", "0.05"), else powers of ten ("1 × 10²⁰", "1 × 10⁻¹⁵") as
 * formatScientific writes them, without its padding zeros (limits are round numbers);
 * always the typographic minus.
 */
export function formatLimit(value: number): string {
  const abs = Math.abs(value);
  if (value === 0 || (abs >= 1e-3 && abs < 1e6)) return String(value).replace('-', '\u2212');
  return formatScientific(value).replace(/\.?0+ ×/, ' ×');
}

const range = (b: Bound, which: 'hard' | 'usual') => `${formatLimit(b[which][0])} to ${formatLimit(b[which][1])}${b.unit ? ` ${b.unit}` : ''}`;

/** Message for a value outside the hard range, or null when it is inside. */
export function outsideHard(name: BoundName, value: number): string | null {
  const b = BOUNDS[name];
  if (!Number.isFinite(value)) return `expected a finite ${b.what}, got ${value}`;
  if (value >= b.hard[0] && value <= b.hard[1]) return null;
  return `${b.what} ${value}${b.unit ? ` ${b.unit}` : ''} is outside ${range(b, 'hard')}`;
}

/** Message for a value inside the hard range but outside the usual one, or null. */
export function outsideUsual(name: BoundName, value: number): string | null {
  const b = BOUNDS[name];
  if (outsideHard(name, value) !== null) return null;
  if (value >= b.usual[0] && value <= b.usual[1]) return null;
  return `${b.what} ${value}${b.unit ? ` ${b.unit}` : ''} is unusual (usually ${range(b, 'usual')})`;
}
