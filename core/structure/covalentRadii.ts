/**
 * Single-bond covalent radii in ångström, from B. Cordero et al., "Covalent radii
 * revisited", Dalton Trans. 2008, 2832–2838, Table 2 (values from memory; sp3 carbon,
 * low-spin values for Mn, Fe, Co). Elements not listed fall back to 1.5 Å (our choice).
 */
export const COVALENT_RADII: Readonly<Record<string, number>> = {
  H: 0.31, D: 0.31, T: 0.31, He: 0.28, Li: 1.28, Be: 0.96, B: 0.84, C: 0.76, N: 0.71, O: 0.66, F: 0.57,
  Na: 1.66, Mg: 1.41, Al: 1.21, Si: 1.11, P: 1.07, S: 1.05, Cl: 1.02, K: 2.03, Ca: 1.76,
  Sc: 1.70, Ti: 1.60, V: 1.53, Cr: 1.39, Mn: 1.39, Fe: 1.32, Co: 1.26, Ni: 1.24, Cu: 1.32, Zn: 1.22,
  Ga: 1.22, Ge: 1.20, As: 1.19, Se: 1.20, Br: 1.20, Rb: 2.20, Sr: 1.95, Y: 1.90, Zr: 1.75, Nb: 1.64,
  Mo: 1.54, Ru: 1.46, Rh: 1.42, Pd: 1.39, Ag: 1.45, Cd: 1.44, In: 1.42, Sn: 1.39, Sb: 1.39, Te: 1.38,
  I: 1.39, Cs: 2.44, Ba: 2.15, La: 2.07, Hf: 1.75, Ta: 1.70, W: 1.62, Re: 1.51, Os: 1.44, Ir: 1.41,
  Pt: 1.36, Au: 1.36, Hg: 1.32, Tl: 1.45, Pb: 1.46, Bi: 1.48,
};

/** Usual valences of main-group atoms (common practice); atoms not listed get no multiple bonds. */
export const USUAL_VALENCE: Readonly<Record<string, number>> = {
  H: 1, D: 1, T: 1, B: 3, C: 4, N: 3, O: 2, F: 1, Si: 4, P: 3, S: 2, Cl: 1, Se: 2, Br: 1, I: 1,
};
