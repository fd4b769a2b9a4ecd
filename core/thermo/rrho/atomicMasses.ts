/**
 * Atomic masses in u (daltons). `isotope`: the most abundant isotope, as quantum-chemistry
 * programs use for frequencies by default (Gaussian); `standard`: the conventional standard
 * atomic weight (ORCA's default). Values from memory of the AME2016 atomic-mass evaluation
 * (W. J. Huang et al., Chin. Phys. C 41, 030002 (2017)) and the IUPAC table of standard atomic
 * weights (abridged); tests check them against the masses the programs print.
 */
const MASSES: Record<string, readonly [isotope: number, standard: number]> = {
  H: [1.00782503223, 1.008], D: [2.01410177812, 2.0141], T: [3.01604928132, 3.016], He: [4.00260325413, 4.0026],
  Li: [7.0160034366, 6.94], Be: [9.012183065, 9.0122], B: [11.00930536, 10.81], C: [12, 12.011], N: [14.00307400443, 14.007],
  O: [15.99491461957, 15.999], F: [18.99840316273, 18.998], Ne: [19.9924401762, 20.18], Na: [22.989769282, 22.99],
  Mg: [23.985041697, 24.305], Al: [26.98153853, 26.982], Si: [27.97692653465, 28.085], P: [30.97376199842, 30.974],
  S: [31.9720711744, 32.06], Cl: [34.968852682, 35.45], Ar: [39.9623831237, 39.95], K: [38.9637064864, 39.098],
  Ca: [39.962590863, 40.078], Sc: [44.95590828, 44.956], Ti: [47.94794198, 47.867], V: [50.94395704, 50.942],
  Cr: [51.94050623, 51.996], Mn: [54.93804391, 54.938], Fe: [55.93493633, 55.845], Co: [58.93319429, 58.933],
  Ni: [57.93534241, 58.693], Cu: [62.92959772, 63.546], Zn: [63.92914201, 65.38], Ga: [68.9255735, 69.723],
  Ge: [73.921177761, 72.63], As: [74.92159457, 74.922], Se: [79.9165218, 78.971], Br: [78.9183376, 79.904],
  Kr: [83.9114977282, 83.798], Ru: [101.9043441, 101.07], Rh: [102.905498, 102.91], Pd: [105.9034804, 106.42],
  Ag: [106.9050916, 107.87], Cd: [113.90336509, 112.41], Sn: [119.90220163, 118.71], Sb: [120.903812, 121.76],
  Te: [129.906222748, 127.6], I: [126.9044719, 126.9], Xe: [131.9041550856, 131.29], Cs: [132.905451961, 132.91],
  Ba: [137.905247, 137.33], W: [183.95093092, 183.84], Re: [186.9557501, 186.21], Os: [191.961477, 190.23],
  Ir: [192.9629216, 192.22], Pt: [194.9647917, 195.08], Au: [196.96656879, 196.97], Hg: [201.9706434, 200.59],
  Tl: [204.9744278, 204.38], Pb: [207.9766525, 207.2], Bi: [208.9803991, 208.98],
};

/** Which mass table: most abundant isotope or standard atomic weight. */
export type MassTable = 'isotope' | 'standard';

/** Mass of an atom in u, or null for an element the table does not hold. */
export function atomicMass(symbol: string, table: MassTable): number | null {
  const entry = MASSES[symbol];
  return entry ? entry[table === 'isotope' ? 0 : 1] : null;
}
