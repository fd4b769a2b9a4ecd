import { fromJoulesPerMol, toJoulesPerMol } from '../../../core/units/energy.ts';

/** kcal/mol → J/mol. */
export const kcal = (x: number): number => toJoulesPerMol(x, 'kcal/mol');
/** J/mol → kcal/mol. */
export const toKcal = (j: number): number => fromJoulesPerMol(j, 'kcal/mol');
/** kJ/mol → J/mol. */
export const kj = (x: number): number => toJoulesPerMol(x, 'kJ/mol');
/** Relative difference |a − b| / |b|. */
export const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);

/**
 * NIST-JANAF 298.15 K values (Chase, NIST-JANAF Thermochemical Tables, 4th ed., J. Phys. Chem.
 * Ref. Data Monograph 9 (1998)) as printed in REFERENCE.md §4, tables C-067, O-029, C-095,
 * H-063, H-064, N-023, H-050, H-083, C-093.
 */
export const JANAF_CSV = [
  'species,dfH [kJ/mol],S [J/(mol K)],dfG [kJ/mol]',
  'CH4(g),-74.873,186.251,-50.768',
  'O2(g),0,205.147,0',
  'CO2(g),-393.522,213.795,-394.389',
  'H2O(l),-285.830,69.950,-237.141',
  'H2O(g),-241.826,188.834,-228.582',
  'N2(g),0,191.609,0',
  'H2(g),0,130.680,0',
  'NH3(g),-45.898,192.774,-16.367',
  'CO(g),-110.527,197.653,-137.163',
].join('\n');

/**
 * CODATA Key Values (Cox, Wagman, Medvedev, CODATA Key Values for Thermodynamics, Hemisphere
 * 1989) as printed in REFERENCE.md §4; no ΔfG° column (the Key Values do not tabulate it).
 */
export const CODATA_CSV = [
  'species,dfH [kJ/mol],S [J/(mol K)]',
  'O2(g),0,205.152',
  'CO2(g),-393.51,213.785',
  'H2O(g),-241.826,188.835',
  'N2(g),0,191.609',
  'H2(g),0,130.680',
  'NH3(g),-45.94,192.77',
  'CO(g),-110.53,197.660',
].join('\n');
