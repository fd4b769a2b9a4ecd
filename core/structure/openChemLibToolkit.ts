import type { Molecule as MoleculeInput } from '../model/schema.ts';
import { hillOrder } from '../thermo/composition.ts';
import { perceiveBonds } from './perceiveBonds.ts';
import { readXyz } from './readXyz.ts';
import type { Depiction, DepictionBond, StructureFacts, StructureResult, StructureToolkit } from './structureToolkit.ts';

type OclModule = typeof import('openchemlib');
type OclMolecule = InstanceType<OclModule['Molecule']>;

/**
 * The structure toolkit on OpenChemLib (pure JavaScript; see DEVELOPERS.md for why it
 * was chosen): SMILES and molfiles are parsed by OpenChemLib; an XYZ geometry gets its
 * bonds from perceiveBonds and is then handed to OpenChemLib like a molfile. 2D
 * coordinates are OpenChemLib's (a molfile's own 2D coordinates are kept).
 */
export function openChemLibToolkit(OCL: OclModule): StructureToolkit {
  return {
    name: `openchemlib ${OCL.version ?? ''}`.trim(),
    read(input) {
      try {
        return input.format === 'xyz' ? readXyzMolecule(OCL, input) : readWritten(OCL, input);
      } catch (error) {
        return { ok: false, message: `${input.format === 'smiles' ? 'SMILES' : 'molfile'}: ${cleanMessage(error)}` };
      }
    },
  };
}

function readWritten(OCL: OclModule, input: MoleculeInput): StructureResult {
  const mol = input.format === 'smiles' ? OCL.Molecule.fromSmiles(input.text.trim()) : OCL.Molecule.fromMolfile(input.text);
  if (mol.getAllAtoms() === 0) return { ok: false, message: `${input.format === 'smiles' ? 'SMILES' : 'molfile'}: no atoms found` };
  mol.ensureHelperArrays(OCL.Molecule.cHelperRings);
  const counts: Record<string, number> = {};
  let charge = 0;
  for (let a = 0; a < mol.getAllAtoms(); a++) {
    const symbol = elementOf(mol, a);
    counts[symbol] = (counts[symbol] ?? 0) + 1;
    const h = mol.getImplicitHydrogens(a);
    if (h > 0) counts.H = (counts.H ?? 0) + h;
    charge += mol.getAtomCharge(a);
  }
  const flat = input.format === 'molfile' && hasFlatCoordinates(mol);
  const partial = markPartial(OCL, mol, input.partialBonds ?? [], !flat);
  if (!partial.ok) return partial;
  if (!flat) mol.inventCoordinates();
  return { ok: true, value: facts({ counts, charge }, depict(OCL, mol, partial.bonds, (a) => mol.getImplicitHydrogens(a))) };
}

function readXyzMolecule(OCL: OclModule, input: MoleculeInput): StructureResult {
  const read = readXyz(input.text);
  if (!read.ok) return read;
  const counts: Record<string, number> = {};
  for (const atom of read.atoms) counts[atom.element] = (counts[atom.element] ?? 0) + 1;
  const bonds = perceiveBonds(read.atoms);
  // A hydrogen on one heavy atom joins that atom's label; OpenChemLib would drop it anyway.
  const partners = read.atoms.map(() => [] as number[]);
  for (const b of bonds) { partners[b.from]!.push(b.to); partners[b.to]!.push(b.from); }
  const isH = (i: number) => ['H', 'D', 'T'].includes(read.atoms[i]!.element);
  const folded = read.atoms.map((_, i) => isH(i) && partners[i]!.length === 1 && !isH(partners[i]![0]!));
  const index = new Array<number>(read.atoms.length).fill(-1);
  const mol = new OCL.Molecule(read.atoms.length, bonds.length + 1);
  const hydrogens: number[] = [];
  read.atoms.forEach((atom, i) => {
    if (folded[i]) return;
    index[i] = mol.addAtom(OCL.Molecule.getAtomicNoFromLabel(isH(i) ? 'H' : atom.element));
    hydrogens[index[i]!] = 0;
  });
  read.atoms.forEach((_, i) => { if (folded[i]) hydrogens[index[partners[i]![0]!]!]!++; });
  const types = [OCL.Molecule.cBondTypeMetalLigand, OCL.Molecule.cBondTypeSingle, OCL.Molecule.cBondTypeDouble, OCL.Molecule.cBondTypeTriple];
  for (const b of bonds) {
    if (folded[b.from] || folded[b.to]) continue;
    mol.setBondType(mol.addBond(index[b.from]!, index[b.to]!), types[b.order]!);
  }
  mol.ensureHelperArrays(OCL.Molecule.cHelperRings);
  mol.inventCoordinates();
  // XYZ lists every atom: an atom's hydrogens are the ones folded in above, never implicit ones.
  return { ok: true, value: facts({ counts, charge: input.charge ?? 0 }, depict(OCL, mol, new Set(), (a) => hydrogens[a] ?? 0)) };
}

function facts(composition: { counts: Record<string, number>; charge: number }, depiction: Depiction): StructureFacts {
  const formula = hillOrder(Object.keys(composition.counts)).map((e) => `${e}${composition.counts[e] === 1 ? '' : composition.counts[e]}`).join('');
  const heavyAtoms = Object.entries(composition.counts).reduce((n, [e, c]) => (e === 'H' || e === 'D' || e === 'T' ? n : n + c), 0);
  return { composition, formula, heavyAtoms, depiction };
}

function elementOf(mol: OclMolecule, a: number): string {
  if (mol.getAtomicNo(a) === 1) return mol.getAtomMass(a) === 2 ? 'D' : mol.getAtomMass(a) === 3 ? 'T' : 'H';
  return mol.getAtomLabel(a);
}

function hasFlatCoordinates(mol: OclMolecule): boolean {
  let spread = 0;
  for (let a = 0; a < mol.getAllAtoms(); a++) {
    if (mol.getAtomZ(a) !== 0) return false;
    spread += Math.abs(mol.getAtomX(a)) + Math.abs(mol.getAtomY(a));
  }
  return spread > 0 || mol.getAllAtoms() === 1;
}

/**
 * Finds the bonds named by atom map numbers; a pair with no bond between them gets one
 * (a forming bond) when `mayAdd`, added after the formula was counted.
 */
function markPartial(OCL: OclModule, mol: OclMolecule, pairs: readonly (readonly [number, number])[], mayAdd: boolean): { ok: true; bonds: Set<number> } | { ok: false; message: string } {
  const bonds = new Set<number>();
  const atomOf = (mapNo: number) => {
    for (let a = 0; a < mol.getAllAtoms(); a++) if (mol.getAtomMapNo(a) === mapNo) return a;
    return -1;
  };
  for (const [m1, m2] of pairs) {
    const a1 = atomOf(m1), a2 = atomOf(m2);
    const missing = a1 < 0 ? m1 : a2 < 0 ? m2 : null;
    if (missing !== null) return { ok: false, message: `forming/breaking bond ${m1}–${m2}: no atom has map number ${missing}` };
    let bond = mol.getBond(a1, a2);
    if (bond < 0) {
      if (!mayAdd) return { ok: false, message: `forming/breaking bond ${m1}–${m2}: the atoms are not bonded in the drawing` };
      bond = mol.addBond(a1, a2);
      mol.setBondType(bond, OCL.Molecule.cBondTypeMetalLigand);
    }
    bonds.add(bond);
  }
  return { ok: true, bonds };
}

/** OpenChemLib's molecule as a plain depiction, explicit H atoms folded into their neighbour's label. */
function depict(OCL: OclModule, mol: OclMolecule, partial: ReadonlySet<number>, implicitH: (atom: number) => number): Depiction {
  mol.ensureHelperArrays(OCL.Molecule.cHelperNeighbours);
  const n = mol.getAllAtoms();
  const fold = new Array<number>(n).fill(-1);
  for (let b = 0; b < mol.getAllBonds(); b++) {
    const [a1, a2] = [mol.getBondAtom(0, b), mol.getBondAtom(1, b)];
    if (partial.has(b) || mol.isStereoBond(b)) continue;
    for (const [h, other] of [[a1, a2], [a2, a1]] as const) {
      if (mol.getAtomicNo(h) === 1 && mol.getAtomicNo(other) !== 1 && mol.getAllConnAtoms(h) === 1 && mol.getAtomMapNo(h) === 0 && mol.getAtomCharge(h) === 0) fold[h] = other;
    }
  }
  const index = new Array<number>(n).fill(-1);
  const atoms: Depiction['atoms'] = [];
  for (let a = 0; a < n; a++) {
    if (fold[a]! >= 0) continue;
    index[a] = atoms.length;
    atoms.push({ x: mol.getAtomX(a), y: mol.getAtomY(a), element: elementOf(mol, a), hydrogens: implicitH(a), charge: mol.getAtomCharge(a), mapNo: mol.getAtomMapNo(a) });
  }
  for (let a = 0; a < n; a++) if (fold[a]! >= 0) atoms[index[fold[a]!]!]!.hydrogens++;
  const bonds: DepictionBond[] = [];
  for (let b = 0; b < mol.getAllBonds(); b++) {
    const from = index[mol.getBondAtom(0, b)]!, to = index[mol.getBondAtom(1, b)]!;
    if (from < 0 || to < 0) continue;
    const type = mol.getBondType(b);
    const stereo = type === OCL.Molecule.cBondTypeUp ? 'wedge' : type === OCL.Molecule.cBondTypeDown ? 'hash' : 'none';
    const order = type === OCL.Molecule.cBondTypeMetalLigand ? 0 : Math.min(3, mol.getBondOrder(b)) as 1 | 2 | 3;
    bonds.push({ from, to, order: partial.has(b) ? 1 : order, stereo, partial: partial.has(b) });
  }
  return normalise({ atoms, bonds });
}

/** Scales to an average bond length of 1 and centres on the origin. */
function normalise(d: Depiction): Depiction {
  const lengths = d.bonds.map((b) => Math.hypot(d.atoms[b.from]!.x - d.atoms[b.to]!.x, d.atoms[b.from]!.y - d.atoms[b.to]!.y)).filter((l) => l > 1e-9);
  const mean = lengths.length ? lengths.reduce((s, l) => s + l, 0) / lengths.length : 1;
  const xs = d.atoms.map((a) => a.x), ys = d.atoms.map((a) => a.y);
  const cx = (Math.min(...xs) + Math.max(...xs)) / 2, cy = (Math.min(...ys) + Math.max(...ys)) / 2;
  return { ...d, atoms: d.atoms.map((a) => ({ ...a, x: (a.x - cx) / mean, y: (a.y - cy) / mean })) };
}

function cleanMessage(error: unknown): string {
  const text = error instanceof Error ? error.message : String(error);
  return text.replace(/^[\w$.]*(Exception|Class\$\w+):\s*/i, '').replace(/^SmilesParser:\s*/, '').trim() || 'could not be read';
}
