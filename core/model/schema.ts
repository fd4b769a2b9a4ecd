import { z } from 'zod';
import { ENERGY_UNITS } from '../units/energy.ts';

/**
 * The Passline document, format version 1. A `.passline` file is this object as JSON.
 * Energies are stored with their unit next to them so that changing the display unit
 * never changes what the user typed.
 */
export const FORMAT_ID = 'passline';
export const FORMAT_VERSION = 2;

const finite = (what: string) =>
  z.number({ error: (issue) => `expected a number${what}, got ${describe(issue.input)}` })
    .refine(Number.isFinite, { message: `expected a finite number${what}` });

/** Short description of an offending value for messages. */
export function describe(value: unknown): string {
  if (value === undefined) return 'nothing';
  if (typeof value === 'string') return JSON.stringify(value.length > 40 ? `${value.slice(0, 40)}…` : value);
  if (typeof value === 'number') return String(value);
  if (value === null) return 'null';
  return Array.isArray(value) ? 'a list' : typeof value;
}

export const Unit = z.enum(ENERGY_UNITS, { error: (i) => `expected one of ${ENERGY_UNITS.join(', ')}, got ${describe(i.input)}` });
export const Quantity = z.enum(['E', 'H', 'G'], { error: (i) => `expected E, H or G, got ${describe(i.input)}` });
export const PointKind = z.enum(['min', 'ts'], { error: (i) => `expected "min" or "ts", got ${describe(i.input)}` });
const positive = (what: string) => finite(what).refine((v) => v > 0, { message: `expected a positive number${what}` });

/** One species count inside a state: `{ species: "cat", count: 1 }`. */
export const SpeciesTerm = z.strictObject({
  species: z.string().min(1),
  count: finite('').refine((v) => v > 0, { message: 'expected a positive count' }),
});

/** Absolute energies of one structure, in hartree. */
export const Structure = z.strictObject({
  label: z.string().optional(),
  electronic: finite(' in hartree'),
  singlePoint: finite(' in hartree').optional(),
  hCorrection: finite(' in hartree').optional(),
  gCorrection: finite(' in hartree').optional(),
});

export const Species = z.strictObject({
  id: z.string().min(1, 'expected a non-empty id'),
  label: z.string(),
  formula: z.string().optional(),
  charge: finite('').optional(),
  /** How this species enters a standard-state correction. */
  /** 'liquid' is a neat liquid reactant: it gets the same neat-liquid standard state as a solvent. */
  phase: z.enum(['solute', 'solvent', 'liquid', 'gas', 'none']).default('solute'),
  /** Molar concentration of the neat liquid (mol/L) when phase is 'solvent'. */
  neatConcentration: positive(' in mol/L').optional(),
  /** Temperature (K) at which the thermal corrections were computed. */
  correctionTemperatureK: positive(' in K').optional(),
  /** One structure, or several conformers that are Boltzmann-weighted. */
  structures: z.array(Structure).default([]),
  formation: z.strictObject({
    dfH: finite(' in kJ/mol').optional(),
    S: finite(' in J/(mol K)').optional(),
    dfG: finite(' in kJ/mol').optional(),
  }).optional(),
});

const valueIn = finite('');
const EnergyValue = z.strictObject({ mode: z.literal('value'), value: valueIn, unit: Unit, quantity: Quantity.optional() });
const EnergySpecies = z.strictObject({ mode: z.literal('species'), terms: z.array(SpeciesTerm).min(1, 'expected at least one species') });
const EnergyFormation = z.strictObject({ mode: z.literal('formation'), terms: z.array(SpeciesTerm).min(1, 'expected at least one species') });
const EnergyStep = z.strictObject({ mode: z.literal('step'), value: valueIn, unit: Unit, quantity: Quantity.optional() });
const EnergyBarrier = z.strictObject({ mode: z.literal('barrier'), value: valueIn, unit: Unit, quantity: Quantity.optional() });

const RatePoint = z.strictObject({ temperatureK: positive(' in K'), k: positive(' (rate constant)') });
export const Estimate = z.discriminatedUnion('method', [
  z.strictObject({ method: z.literal('marcus'), lambda: positive(''), unit: Unit }),
  z.strictObject({ method: z.literal('bep'), e0: valueIn, alpha: valueIn, unit: Unit }),
  z.strictObject({ method: z.literal('rateConstant'), k: positive(' (rate constant)'), molecularity: z.int().min(1).max(3).default(1), temperatureK: positive(' in K').optional() }),
  z.strictObject({ method: z.literal('halfLife'), seconds: positive(' in s'), temperatureK: positive(' in K').optional() }),
  z.strictObject({ method: z.literal('eyringFit'), data: z.array(RatePoint).min(2, 'expected at least two (T, k) points') }),
  z.strictObject({ method: z.literal('arrhenius'), data: z.array(RatePoint).min(2, 'expected at least two (T, k) points') }),
], { error: (i) => `expected an estimate method (marcus, bep, rateConstant, halfLife, eyringFit, arrhenius), got ${describe((i.input as { method?: unknown } | undefined)?.method)}` });
const EnergyEstimate = z.strictObject({ mode: z.literal('estimate'), estimate: Estimate });

export const EnergySpec = z.discriminatedUnion('mode', [EnergyValue, EnergySpecies, EnergyFormation, EnergyStep, EnergyBarrier, EnergyEstimate], {
  error: (i) => `expected an energy mode (value, species, formation, step, barrier, estimate), got ${describe((i.input as { mode?: unknown } | undefined)?.mode)}`,
});

export const Point = z.strictObject({
  id: z.string().min(1),
  label: z.string(),
  kind: PointKind,
  energy: EnergySpec,
  /**
   * What the state is made of, when its energy is not given as species: used for mass
   * balance, Hess checks, molecularity and microkinetic networks.
   */
  composition: z.array(SpeciesTerm).optional(),
  /** Layout overrides, in figure units (slot index) and mm. */
  x: finite('').optional(),
  barWidthMm: positive(' in mm').optional(),
  labelOffsetMm: z.strictObject({ dx: finite(' in mm'), dy: finite(' in mm') }).optional(),
});

export const PathwayStyle = z.strictObject({
  colour: z.string().regex(/^#[0-9a-fA-F]{6}$/, 'expected a colour like #1f77b4').optional(),
  dash: z.enum(['solid', 'dashed', 'dotted', 'dashdot']).optional(),
  visible: z.boolean().default(true),
});

export const Pathway = z.strictObject({
  id: z.string().min(1),
  name: z.string(),
  cycle: z.boolean().default(false),
  style: PathwayStyle.default({ visible: true }),
  points: z.array(Point),
});

export const Settings = z.strictObject({
  quantity: Quantity.default('G'),
  temperatureK: positive(' in K').default(298.15),
  unit: Unit.default('kcal/mol'),
  /** 1 atm or 1 bar gas-phase values corrected to 1 mol/L per solute species. */
  standardState: z.enum(['as-computed', '1atm-to-1M', '1bar-to-1M']).default('as-computed'),
  decimals: z.int().min(0).max(6).default(1),
  transmission: positive('').default(1),
  /** Shared reference state for all pathways, or each pathway's first point. */
  reference: z.union([
    z.strictObject({ kind: z.literal('first') }),
    z.strictObject({ kind: z.literal('point'), pathway: z.string(), point: z.string() }),
  ]).default({ kind: 'first' }),
});

export const Figure = z.strictObject({
  preset: z.enum(['single', 'double', 'slide']).default('double'),
  widthMm: positive(' in mm').optional(),
  heightMm: positive(' in mm').optional(),
  theme: z.enum(['colour', 'greyscale', 'dark']).default('colour'),
  fontSizePt: positive(' in pt').default(8),
  lineWidthPt: positive(' in pt').default(1),
  connector: z.enum(['dashed', 'line', 'curve']).default('dashed'),
  showAxis: z.boolean().default(true),
  showCoordinateArrow: z.boolean().default(true),
  showLegend: z.boolean().default(true),
  daggerOnTs: z.boolean().default(true),
  energyFormat: z.enum(['plain', 'parentheses', 'withUnit']).default('plain'),
  annotations: z.array(z.discriminatedUnion('type', [
    z.strictObject({ type: z.literal('barrier'), pathway: z.string(), from: z.string(), to: z.string() }),
    z.strictObject({ type: z.literal('span'), pathway: z.string() }),
    z.strictObject({ type: z.literal('text'), text: z.string(), x: finite(''), y: finite('') }),
  ])).default([]),
});

/** A comparison the user asked for: rate enhancement of one pathway over another, or selectivity between competing pathways. */
export const Comparison = z.discriminatedUnion('type', [
  z.strictObject({ type: z.literal('rate'), baseline: z.string(), candidate: z.string() }),
  z.strictObject({ type: z.literal('selectivity'), pathways: z.array(z.string()).min(2, 'expected at least two pathways'), enantiomeric: z.boolean().default(false) }),
], { error: (i) => `expected a comparison type (rate, selectivity), got ${describe((i.input as { type?: unknown } | undefined)?.type)}` });

export const Document = z.strictObject({
  format: z.literal(FORMAT_ID, { error: 'expected "passline" (this is not a Passline document)' }),
  version: z.literal(FORMAT_VERSION),
  title: z.string().default(''),
  settings: Settings.default(() => Settings.parse({})),
  species: z.array(Species).default([]),
  pathways: z.array(Pathway).default([]),
  comparisons: z.array(Comparison).default([]),
  figure: Figure.default(() => Figure.parse({})),
});

export type Unit = z.infer<typeof Unit>;
export type Quantity = z.infer<typeof Quantity>;
export type PointKind = z.infer<typeof PointKind>;
export type SpeciesTerm = z.infer<typeof SpeciesTerm>;
export type Structure = z.infer<typeof Structure>;
export type Species = z.infer<typeof Species>;
export type Estimate = z.infer<typeof Estimate>;
export type EnergySpec = z.infer<typeof EnergySpec>;
export type Point = z.infer<typeof Point>;
export type PathwayStyle = z.infer<typeof PathwayStyle>;
export type Pathway = z.infer<typeof Pathway>;
export type Settings = z.infer<typeof Settings>;
export type Figure = z.infer<typeof Figure>;
export type Comparison = z.infer<typeof Comparison>;
export type Document = z.infer<typeof Document>;
/** A document as it may be written by hand: defaults may be left out. */
export type DocumentInput = z.input<typeof Document>;
