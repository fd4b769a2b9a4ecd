import { ATOMIC_MASS_KG, BOLTZMANN, GAS_CONSTANT, PLANCK, SPEED_OF_LIGHT } from '../../units/constants.ts';
import { atomicMass, type MassTable } from './atomicMasses.ts';
import { principalMoments } from './principalMoments.ts';
import { grimmeEntropy, harmonicEntropy, truhlarFrequency, type QuasiHarmonic } from './quasiHarmonic.ts';

/** What {@link rrhoThermo} needs: a geometry (Å), its frequencies and the conditions. */
export interface RrhoInput {
  atoms: readonly { symbol: string; x: number; y: number; z: number }[];
  /** Harmonic frequencies in cm⁻¹; imaginary ones negative (left out of the vibrational sums). */
  frequenciesCm1: readonly number[];
  symmetryNumber: number;
  /** Spin multiplicity 2S + 1: the electronic degeneracy (no low-lying excited states). */
  multiplicity: number;
  temperatureK: number;
  /** Standard pressure of the gas-phase reference, Pa (101 325 for 1 atm, 10⁵ for 1 bar). */
  pressurePa: number;
  masses: MassTable;
  quasiHarmonic: QuasiHarmonic;
}

/** One contribution: entropy J mol⁻¹ K⁻¹ and thermal energy J mol⁻¹. */
export interface RrhoPart { entropy: number; energy: number }

/** Thermal corrections to the electronic energy, J/mol (and S in J mol⁻¹ K⁻¹), with provenance. */
export interface RrhoResult {
  zpe: number;
  /** U − E_el, including the ZPE. */
  thermalEnergy: number;
  /** H − E_el = U − E_el + RT. */
  enthalpy: number;
  entropy: number;
  /** G − E_el = H − E_el − T S. */
  gibbs: number;
  parts: { translation: RrhoPart; rotation: RrhoPart; vibration: RrhoPart; electronic: RrhoPart };
  /** How it was computed, in one sentence. */
  method: string;
  /** The geometry as the terms used it (what a document keeps to recompute at another T). */
  geometry: { massU: number; momentsUA2: [number, number, number]; atomCount: number };
  notes: string[];
}

const ANGSTROM = 1e-10;
const cm1ToKelvin = (cm1: number) => (PLANCK * SPEED_OF_LIGHT * 100 * cm1) / BOLTZMANN;

/**
 * Rigid-rotor harmonic-oscillator thermochemistry of an ideal gas (any statistical-
 * thermodynamics text, e.g. D. A. McQuarrie, Statistical Mechanics (1976), chs. 5–8, from
 * memory): translation from the mass and pressure, rotation from the principal moments of
 * the geometry and the symmetry number (atom, linear or non-linear), vibration from the real
 * frequencies, electronic degeneracy from the multiplicity. Low modes optionally by
 * Grimme's entropy interpolation or Truhlar's frequency raise. Pure; an error value when an
 * element has no mass in the table.
 */
export function rrhoThermo(input: RrhoInput): { ok: true; value: RrhoResult } | { ok: false; message: string } {
  const points = [];
  for (const a of input.atoms) {
    const mass = atomicMass(a.symbol, input.masses);
    if (mass === null) return { ok: false, message: `no atomic mass for ${a.symbol}` };
    points.push({ mass, x: a.x, y: a.y, z: a.z });
  }
  const { atoms: _atoms, masses, ...rest } = input;
  const massLabel = masses === 'isotope' ? 'most abundant isotope' : 'standard atomic weight';
  return { ok: true, value: rrhoFromMoments({ ...rest, massU: points.reduce((s, p) => s + p.mass, 0), momentsUA2: principalMoments(points), atomCount: points.length, massLabel }) };
}

/** What {@link rrhoFromMoments} needs: the geometry reduced to its total mass and principal moments. */
export interface RrhoMomentsInput extends Omit<RrhoInput, 'atoms' | 'masses'> {
  massU: number;
  /** Principal moments of inertia, u Å², ascending. */
  momentsUA2: readonly [number, number, number];
  atomCount: number;
  /** Which masses, for the provenance sentence. */
  massLabel: string;
}

/** {@link rrhoThermo} from the total mass and principal moments (what a document keeps to recompute at another T). */
export function rrhoFromMoments(input: RrhoMomentsInput): RrhoResult {
  const { temperatureK: t, quasiHarmonic: qh } = input;
  const rt = GAS_CONSTANT * t;
  const notes: string[] = [];
  const massKg = input.massU * ATOMIC_MASS_KG;
  const lambda = (2 * Math.PI * massKg * BOLTZMANN * t) / PLANCK ** 2;
  const translation = { entropy: GAS_CONSTANT * (Math.log(lambda ** 1.5 * (BOLTZMANN * t) / input.pressurePa) + 2.5), energy: 1.5 * rt };
  const moments = input.momentsUA2;
  const theta = moments.map((i) => PLANCK ** 2 / (8 * Math.PI ** 2 * i * ATOMIC_MASS_KG * ANGSTROM ** 2 * BOLTZMANN));
  const sigma = input.symmetryNumber;
  let rotation: RrhoPart;
  let expected: number;
  if (input.atomCount === 1) {
    rotation = { entropy: 0, energy: 0 };
    expected = 0;
  } else if (moments[0] < 1e-6 * moments[2]) {
    rotation = { entropy: GAS_CONSTANT * (Math.log(t / (sigma * theta[2]!)) + 1), energy: rt };
    expected = 3 * input.atomCount - 5;
  } else {
    const q = (Math.sqrt(Math.PI) / sigma) * t ** 1.5 / Math.sqrt(theta[0]! * theta[1]! * theta[2]!);
    rotation = { entropy: GAS_CONSTANT * (Math.log(q) + 1.5), energy: 1.5 * rt };
    expected = 3 * input.atomCount - 6;
  }
  const real = input.frequenciesCm1.filter((f) => f > 0);
  const imaginary = input.frequenciesCm1.length - real.length;
  if (imaginary > 0) notes.push(`${imaginary} imaginary or zero frequenc${imaginary === 1 ? 'y' : 'ies'} left out of the vibrational terms`);
  if (input.frequenciesCm1.length !== expected) notes.push(`${input.frequenciesCm1.length} frequencies for ${expected} vibrational degrees of freedom`);
  let zpe = 0, vibEnergy = 0, vibEntropy = 0, raised = 0;
  for (const f of real) {
    const used = qh.method === 'truhlar' ? truhlarFrequency(f, qh.cutoffCm1) : f;
    if (used !== f) raised++;
    const th = cm1ToKelvin(used);
    zpe += 0.5 * GAS_CONSTANT * th;
    vibEnergy += GAS_CONSTANT * th * (0.5 + 1 / Math.expm1(th / t));
    vibEntropy += qh.method === 'grimme' ? grimmeEntropy(used, t, qh.cutoffCm1) : harmonicEntropy(used, t);
  }
  const electronic = { entropy: GAS_CONSTANT * Math.log(input.multiplicity), energy: 0 };
  const entropy = translation.entropy + rotation.entropy + vibEntropy + electronic.entropy;
  const thermalEnergy = translation.energy + rotation.energy + vibEnergy;
  const enthalpy = thermalEnergy + rt;
  const low = qh.method === 'off' ? 'harmonic for all modes'
    : qh.method === 'grimme' ? `Grimme's quasi-RRHO entropy below ${qh.cutoffCm1} cm⁻¹ (Chem. Eur. J. 18, 9955 (2012))`
      : `Truhlar's quasi-harmonic raise of ${raised} mode${raised === 1 ? '' : 's'} to ${qh.cutoffCm1} cm⁻¹ (J. Phys. Chem. B 115, 14556 (2011))`;
  return {
    zpe, thermalEnergy, enthalpy, entropy, gibbs: enthalpy - t * entropy,
    parts: { translation, rotation, vibration: { entropy: vibEntropy, energy: vibEnergy }, electronic },
    method: `RRHO at ${t} K and ${input.pressurePa} Pa, σ = ${sigma}, ${input.massLabel} masses, ${low}`,
    geometry: { massU: input.massU, momentsUA2: [...moments] as [number, number, number], atomCount: input.atomCount },
    notes,
  };
}
