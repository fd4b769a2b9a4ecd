import './zodSetup.ts';
import * as z from 'zod';
import { ENERGY_UNITS } from '../units/energy.ts';
import { bounded, boundedInt, boundedText, checkEnergyField, checkRelativeSigma } from './bounded.ts';
import { BOUNDS, outsideHard } from './bounds.ts';
import { describe } from './describe.ts';

/**
 * The Passline document, format version 1. A `.passline` file is this object as JSON.
 * Energies are stored with their unit next to them so that changing the display unit
 * never changes what the user typed.
 */
export const FORMAT_ID = 'passline';
export const FORMAT_VERSION = 3;

const finite = (what: string) =>
  z.number({ error: (issue) => `expected a number${what}, got ${describe(issue.input)}` })
    .refine(Number.isFinite, { message: `expected a finite number${what}` });

export { describe };

export const Unit = z.enum(ENERGY_UNITS, { error: (i) => `expected one of ${ENERGY_UNITS.join(', ')}, got ${describe(i.input)}` });
export const Quantity = z.enum(['E', 'H', 'G'], { error: (i) => `expected E, H or G, got ${describe(i.input)}` });
export const PointKind = z.enum(['min', 'ts'], { error: (i) => `expected "min" or "ts", got ${describe(i.input)}` });
const positive = (what: string) => finite(what).refine((v) => v > 0, { message: `expected a positive number${what}` });
/** Optional standard uncertainty σ ≥ 0 of the value beside it, in that value's unit (issue 18). */
const sigma = (what: string) => finite(what).refine((v) => v >= 0, { message: `expected a standard uncertainty ≥ 0${what}` }).optional();

/** One species count inside a state: `{ species: "cat", count: 1 }`. */
export const SpeciesTerm = z.strictObject({
  species: z.string().min(1),
  count: bounded('count'),
});

/** One calculation output a structure's numbers were read from. */
export const SourceFile = z.strictObject({
  file: z.string().min(1),
  /** What was taken from it: the electronic energy, the thermal corrections, or both. */
  role: z.enum(['energy', 'corrections', 'energy+corrections', 'geometry']),
  program: z.string(),
  method: z.string().optional(),
  termination: z.enum(['normal', 'abnormal', 'truncated']),
  optimisation: z.enum(['converged', 'not-converged', 'none']),
});

/** Absolute energies of one structure, in hartree. */
export const Structure = z.strictObject({
  label: boundedText().optional(),
  electronic: bounded('absoluteEnergyHartree', ' in hartree'),
  singlePoint: bounded('absoluteEnergyHartree', ' in hartree').optional(),
  hCorrection: bounded('correctionHartree', ' in hartree').optional(),
  gCorrection: bounded('correctionHartree', ' in hartree').optional(),
  /** σ of the electronic (or single-point) energy, and of the thermal correction used, in hartree. */
  sigma: sigma(' in hartree'),
  correctionSigma: sigma(' in hartree'),
  /** Harmonic frequencies in cm⁻¹ (imaginary ones negative), when read from an output. */
  frequencies: z.array(finite(' in cm⁻¹')).optional(),
  /**
   * What the RRHO corrections were computed from, so that another temperature recomputes
   * them exactly (with `frequencies`): total mass, principal moments, symmetry number,
   * multiplicity, standard pressure and the low-mode treatment.
   */
  rrho: z.strictObject({
    massU: positive(' in u'),
    momentsUA2: z.array(finite(' in u Å²').refine((v) => v >= 0, { message: 'expected a moment of inertia ≥ 0' })).length(3),
    atomCount: z.int().min(1),
    symmetryNumber: z.int().min(1),
    multiplicity: z.int().min(1),
    pressurePa: positive(' in Pa'),
    masses: boundedText(),
    quasiHarmonic: z.enum(['off', 'grimme', 'truhlar']),
    cutoffCm1: positive(' in cm⁻¹'),
  }).optional(),
  /** The output files behind these numbers and how the corrections were made. */
  source: z.strictObject({ files: z.array(SourceFile).min(1), corrections: z.string().optional() }).optional(),
});

/**
 * A molecule's structure as the user gave it: a SMILES string, an MDL molfile, or an XYZ
 * geometry (bonds perceived from interatomic distances). Formula and charge derive from it;
 * the figure draws it beside the level.
 */
export const Molecule = z.strictObject({
  format: z.enum(['smiles', 'molfile', 'xyz'], { error: (i) => `expected a structure format (smiles, molfile, xyz), got ${describe(i.input)}` }),
  text: z.string().trim().min(1, 'expected a structure (SMILES, molfile or XYZ text)').max(1_000_000, 'expected a structure under 1 000 000 characters'),
  /** Net charge of an XYZ geometry (XYZ has none); SMILES and molfiles carry their own. */
  charge: z.int().min(BOUNDS.charge.hard[0]).max(BOUNDS.charge.hard[1]).optional(),
  /**
   * Forming and breaking bonds of a transition state, each as the two atom map numbers
   * (SMILES `[C:2]`, the molfile's mapping column) of a bond in the structure: drawn dashed.
   */
  partialBonds: z.array(z.tuple([z.int().min(1), z.int().min(1)])).max(50).optional(),
});

export const Species = z.strictObject({
  id: z.string().min(1, 'expected a non-empty id'),
  label: boundedText(),
  formula: boundedText().optional(),
  charge: bounded('charge').optional(),
  /** Spin multiplicity 2S + 1, when read from a calculation output. */
  multiplicity: z.int().min(1).optional(),
  /** How this species enters a standard-state correction. */
  /** 'liquid' is a neat liquid reactant: it gets the same neat-liquid standard state as a solvent. */
  phase: z.enum(['solute', 'solvent', 'liquid', 'gas', 'none']).default('solute'),
  /** Molar concentration of the neat liquid (mol/L) when phase is 'solvent'. */
  neatConcentration: positive(' in mol/L').pipe(bounded('concentration')).optional(),
  /** Temperature (K) at which the thermal corrections were computed. */
  correctionTemperatureK: bounded('temperatureK', ' in K').optional(),
  /** One structure, or several conformers that are Boltzmann-weighted. */
  structures: z.array(Structure).default([]),
  /** The species' molecule: its formula and charge then come from it. */
  molecule: Molecule.optional(),
  formation: z.strictObject({
    dfH: bounded('relativeEnergyKJ', ' in kJ/mol').optional(),
    S: bounded('entropy', ' in J/(mol K)').optional(),
    dfG: bounded('relativeEnergyKJ', ' in kJ/mol').optional(),
    dfHSigma: sigma(' in kJ/mol'),
    dfGSigma: sigma(' in kJ/mol'),
  }).optional(),
});

const valueIn = finite('');
const EnergyValue = z.strictObject({ mode: z.literal('value'), value: valueIn, unit: Unit, quantity: Quantity.optional(), sigma: sigma('') }).superRefine(checkEnergyField('relativeEnergyKJ', 'value'));
const EnergySpecies = z.strictObject({ mode: z.literal('species'), terms: z.array(SpeciesTerm).min(1, 'expected at least one species') });
const EnergyFormation = z.strictObject({ mode: z.literal('formation'), terms: z.array(SpeciesTerm).min(1, 'expected at least one species') });
const EnergyStep = z.strictObject({ mode: z.literal('step'), value: valueIn, unit: Unit, quantity: Quantity.optional(), sigma: sigma('') }).superRefine(checkEnergyField('relativeEnergyKJ', 'value'));
const EnergyBarrier = z.strictObject({ mode: z.literal('barrier'), value: valueIn, unit: Unit, quantity: Quantity.optional(), sigma: sigma('') }).superRefine(checkEnergyField('relativeEnergyKJ', 'value'));

/** `kSigma`, `secondsSigma`: σ of a rate constant (its unit) or half-life (s); sampled log-normally (core/uncertainty). */
const RatePoint = z.strictObject({ temperatureK: bounded('temperatureK', ' in K'), k: bounded('rateConstant', ' (rate constant)'), kSigma: sigma(' (σ of k)') }).superRefine(checkRelativeSigma('k', 'kSigma'));
export const Estimate = z.discriminatedUnion('method', [
  z.strictObject({ method: z.literal('marcus'), lambda: positive(''), unit: Unit, lambdaSigma: sigma('') }).superRefine(checkEnergyField('reorganisationKJ', 'lambda')),
  z.strictObject({ method: z.literal('bep'), e0: valueIn, alpha: bounded('bepSlope'), unit: Unit, e0Sigma: sigma('') }).superRefine(checkEnergyField('relativeEnergyKJ', 'e0')),
  z.strictObject({ method: z.literal('rateConstant'), k: bounded('rateConstant', ' (rate constant)'), molecularity: z.int().min(1).max(3).default(1), temperatureK: bounded('temperatureK', ' in K').optional(), kSigma: sigma(' (σ of k)') }).superRefine(checkRelativeSigma('k', 'kSigma')),
  z.strictObject({ method: z.literal('halfLife'), seconds: bounded('timeSeconds', ' in s'), temperatureK: bounded('temperatureK', ' in K').optional(), secondsSigma: sigma(' in s') }).superRefine(checkRelativeSigma('seconds', 'secondsSigma')),
  z.strictObject({ method: z.literal('eyringFit'), data: z.array(RatePoint).min(2, 'expected at least two (T, k) points') }),
  z.strictObject({ method: z.literal('arrhenius'), data: z.array(RatePoint).min(2, 'expected at least two (T, k) points') }),
], { error: (i) => `expected an estimate method (marcus, bep, rateConstant, halfLife, eyringFit, arrhenius), got ${describe((i.input as { method?: unknown } | undefined)?.method)}` });
const EnergyEstimate = z.strictObject({ mode: z.literal('estimate'), estimate: Estimate });

export const EnergySpec = z.discriminatedUnion('mode', [EnergyValue, EnergySpecies, EnergyFormation, EnergyStep, EnergyBarrier, EnergyEstimate], {
  error: (i) => `expected an energy mode (value, species, formation, step, barrier, estimate), got ${describe((i.input as { mode?: unknown } | undefined)?.mode)}`,
});

export const Point = z.strictObject({
  id: z.string().min(1),
  label: boundedText(),
  kind: PointKind,
  energy: EnergySpec,
  /**
   * What the state is made of, when its energy is not given as species: used for mass
   * balance, Hess checks, molecularity and microkinetic networks.
   */
  composition: z.array(SpeciesTerm).optional(),
  /** Layout overrides, in figure units (slot index) and mm. */
  x: bounded('coordinate').optional(),
  barWidthMm: positive(' in mm').pipe(bounded('lengthMm')).optional(),
  labelOffsetMm: z.strictObject({ dx: bounded('offsetMm', ' in mm'), dy: bounded('offsetMm', ' in mm') }).optional(),
  /** A molecule drawn at this point (wins over its species' molecules). */
  molecule: Molecule.optional(),
  /** Which side of the level this point's drawing goes (overrides the figure's choice). */
  moleculeSide: z.enum(['above', 'below']).optional(),
});

export const PathwayStyle = z.strictObject({
  colour: z.string().regex(/^#[0-9a-fA-F]{6}$/, 'expected a colour like #1f77b4').optional(),
  dash: z.enum(['solid', 'dashed', 'dotted', 'dashdot']).optional(),
  visible: z.boolean().default(true),
});

/** A point of another pathway that a pathway starts from: its first point is drawn at that point's energy. */
export const Branch = z.strictObject({ pathway: z.string().min(1), point: z.string().min(1) });

export const Pathway = z.strictObject({
  id: z.string().min(1),
  name: boundedText(),
  cycle: z.boolean().default(false),
  /** This pathway branches from a point of another: its energies are shifted so its first point sits there. */
  branch: Branch.optional(),
  style: PathwayStyle.default({ visible: true }),
  points: z.array(Point),
});

export const Settings = z.strictObject({
  quantity: Quantity.default('G'),
  temperatureK: bounded('temperatureK', ' in K').default(298.15),
  unit: Unit.default('kcal/mol'),
  /** 1 atm or 1 bar gas-phase values corrected to 1 mol/L per solute species. */
  standardState: z.enum(['as-computed', '1atm-to-1M', '1bar-to-1M']).default('as-computed'),
  decimals: z.int().min(0).max(6).default(1),
  transmission: bounded('transmission').default(1),
  /**
   * What every energy is measured from (see core/profile/referenceFrame.ts):
   * `zero` (default) one document-wide zero — typed and stepwise values are shown as typed,
   * species sums and formation sums are relative to the document's first state on their scale;
   * `point` one chosen point shared by all pathways; `species` a sum of species shared by all
   * pathways; `first` each pathway's own first point (format 2 documents, kept by migration).
   */
  reference: z.union([
    z.strictObject({ kind: z.literal('zero') }),
    z.strictObject({ kind: z.literal('first') }),
    z.strictObject({ kind: z.literal('point'), pathway: z.string(), point: z.string() }),
    z.strictObject({ kind: z.literal('species'), terms: z.array(SpeciesTerm).min(1, 'expected at least one species') }),
  ]).default({ kind: 'zero' }),
  /** Monte Carlo settings (issue 18); `defaultSigma` applies to entered energies that carry no σ of their own. */
  uncertainty: z.strictObject({
    defaultSigma: sigma(''),
    defaultSigmaUnit: Unit.default('kcal/mol'),
    samples: z.int().min(10).max(1_000_000).default(10_000),
    seed: z.int().min(0).max(4_294_967_295).default(1),
  }).optional(),
});

export const Figure = z.strictObject({
  preset: z.enum(['single', 'double', 'slide']).default('double'),
  widthMm: bounded('figureMm', ' in mm').optional(),
  heightMm: bounded('figureMm', ' in mm').optional(),
  theme: z.enum(['colour', 'greyscale', 'dark']).default('colour'),
  fontSizePt: bounded('fontPt', ' in pt').default(8),
  lineWidthPt: bounded('linePt', ' in pt').default(1),
  connector: z.enum(['dashed', 'line', 'curve']).default('dashed'),
  showAxis: z.boolean().default(true),
  showCoordinateArrow: z.boolean().default(true),
  showLegend: z.boolean().default(true),
  daggerOnTs: z.boolean().default(true),
  energyFormat: z.enum(['plain', 'parentheses', 'withUnit']).default('plain'),
  /** Molecule drawings beside the levels: shown or not, which side, largest side in mm. */
  molecules: z.strictObject({
    show: z.boolean().default(true),
    side: z.enum(['above', 'below']).default('above'),
    sizeMm: positive(' in mm').refine((v) => outsideHard('lengthMm', v) === null, { message: `expected a drawing size up to ${BOUNDS.lengthMm.hard[1]} mm` }).optional(),
  }).optional(),
  /** Error bars on the levels from the Monte Carlo (issue 18): ±σ of each resolved energy, or its 95 % interval; absent: none. */
  errorBars: z.enum(['sigma', 'interval']).optional(),
  annotations: z.array(z.discriminatedUnion('type', [
    z.strictObject({ type: z.literal('barrier'), pathway: z.string(), from: z.string(), to: z.string() }),
    z.strictObject({ type: z.literal('span'), pathway: z.string() }),
    z.strictObject({ type: z.literal('text'), text: boundedText(), x: bounded('coordinate'), y: finite('') }),
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
  title: boundedText().default(''),
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
export type SourceFile = z.infer<typeof SourceFile>;
export type Molecule = z.infer<typeof Molecule>;
export type Species = z.infer<typeof Species>;
export type Estimate = z.infer<typeof Estimate>;
export type EnergySpec = z.infer<typeof EnergySpec>;
export type Point = z.infer<typeof Point>;
export type PathwayStyle = z.infer<typeof PathwayStyle>;
export type Pathway = z.infer<typeof Pathway>;
export type Branch = z.infer<typeof Branch>;
export type Reference = z.infer<typeof Settings>['reference'];
export type Settings = z.infer<typeof Settings>;
export type Figure = z.infer<typeof Figure>;
export type Comparison = z.infer<typeof Comparison>;
export type Document = z.infer<typeof Document>;
/** A document as it may be written by hand: defaults may be left out. */
export type DocumentInput = z.input<typeof Document>;
