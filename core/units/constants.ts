/**
 * Physical constants, CODATA 2018 (Tiesinga et al., Rev. Mod. Phys. 93, 025010 (2021)).
 * h, k_B, N_A and e are exact since the SI revision of 2019; the hartree is measured.
 */
export const PLANCK = 6.62607015e-34; // J s, exact
export const BOLTZMANN = 1.380649e-23; // J K^-1, exact
export const AVOGADRO = 6.02214076e23; // mol^-1, exact
export const ELEMENTARY_CHARGE = 1.602176634e-19; // C, exact
export const SPEED_OF_LIGHT = 299792458; // m s^-1, exact
export const HARTREE_J = 4.3597447222071e-18; // J, CODATA 2018
/** Gas constant R = N_A k_B in J mol^-1 K^-1 (exact). */
export const GAS_CONSTANT = AVOGADRO * BOLTZMANN;
/** Thermochemical calorie in J (NIST SP 811, exact). */
export const CALORIE_J = 4.184;
export const ATM_PA = 101325;
export const BAR_PA = 100000;
/** Atomic mass constant m_u in kg, CODATA 2018. */
export const ATOMIC_MASS_KG = 1.6605390666e-27;
