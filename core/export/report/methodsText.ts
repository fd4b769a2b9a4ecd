/**
 * The methods paragraphs of a report, written for its reader: how each number was
 * obtained, with the published source of each formula. (Which citations were checked
 * against the papers is recorded beside the tests and in the workplace's REFERENCE.md,
 * not here.)
 */
export const METHODS: readonly string[] = [
  'How the numbers in this report were obtained. Every energy is relative to the reference state named under Settings, in one quantity, unit and temperature; each point\'s source is listed beside it. The formulas and their sources:',
  'Constants: CODATA 2018 exact values of h, k_B, N_A and e (Tiesinga, Mohr, Newell, Taylor, Rev. Mod. Phys. 93, 025010 (2021)); R = N_A k_B; 1 kcal = 4.184 J (NIST SP 811).',
  'Rate constants from transition-state theory (Eyring, J. Chem. Phys. 3, 107 (1935); Evans & Polanyi, Trans. Faraday Soc. 31, 875 (1935)): k = κ (k_B T / h) (c°)^(1−m) exp(−Δ‡G / RT) for a step of molecularity m, c° = 1 mol L⁻¹; reverse rates from detailed balance, K = exp(−ΔG / RT); first-order half-life t½ = ln 2 / k.',
  'Effective barrier of a linear profile: the largest T_j − I_i over a TS j and a minimum i before it.',
  'Catalytic cycles: the energetic span model (Kozuch & Shaik, J. Am. Chem. Soc. 128, 3355 (2006); Acc. Chem. Res. 44, 101 (2011)): TOF = κ (k_B T / h)(1 − e^(ΔG_r/RT)) / Σ_ij e^(δE_ij/RT), δE_ij = T_i − I_j when TS i follows intermediate j, T_i − I_j + ΔG_r otherwise; δE = max δE_ij names the TDTS and TDI; TOF ≈ κ (k_B T / h) e^(−δE/RT); degree of TOF control as in Kozuch & Shaik, J. Phys. Chem. A 112, 6032 (2008).',
  'Barrier estimates where no TS energy is known: Marcus, Δ‡G = (λ/4)(1 + ΔG°/λ)² (Marcus, J. Chem. Phys. 24, 966 (1956)); Bell–Evans–Polanyi, E_a = E₀ + αΔH (Bell, Proc. R. Soc. Lond. A 154, 414 (1936); Evans & Polanyi, Trans. Faraday Soc. 34, 11 (1938)).',
  'Selectivity between competing pathways under Curtin–Hammett control (IUPAC Gold Book, "Curtin–Hammett principle", doi:10.1351/goldbook.C01480): product ratio exp(ΔΔ‡G / RT) from the TS energies on a common reference; rate enhancement exp(ΔΔ‡G / RT) from the effective barriers.',
  'Standard-state correction from 1 atm (or 1 bar) to 1 mol L⁻¹ per solute species: RT ln(R T c° / p°) (Ben-Naim & Marcus, J. Chem. Phys. 81, 2016 (1984)).',
];

/** The caution printed in every report (DESIGN.md, "Cautions"). */
export const CAUTION =
  'Energies and rates here are only as good as their inputs. They are not a process-safety assessment: where a step or reaction is strongly exothermic, confirm the heat release and its rate by calorimetry before any scale-up, and defer to local codes and licensed engineering practice.';
