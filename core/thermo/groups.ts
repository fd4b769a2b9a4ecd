/**
 * Abbreviations of organic groups that chemists write inside formulas (PPh3, NEt3, OTf).
 * Only names that are not element symbols are listed: Ac, Pr and Ts are read as actinium,
 * praseodymium and tennessine, so write them out (C2H3O, C3H7, C7H7SO2).
 */
export const GROUP_ABBREVIATIONS: Readonly<Record<string, Readonly<Record<string, number>>>> = {
  Me: { C: 1, H: 3 },
  Et: { C: 2, H: 5 },
  nPr: { C: 3, H: 7 },
  iPr: { C: 3, H: 7 },
  Bu: { C: 4, H: 9 },
  nBu: { C: 4, H: 9 },
  iBu: { C: 4, H: 9 },
  sBu: { C: 4, H: 9 },
  tBu: { C: 4, H: 9 },
  Ph: { C: 6, H: 5 },
  Bn: { C: 7, H: 7 },
  Cy: { C: 6, H: 11 },
  Cp: { C: 5, H: 5 },
  Mes: { C: 9, H: 11 },
  Py: { C: 5, H: 5, N: 1 },
  Tf: { C: 1, F: 3, S: 1, O: 2 },
  Ms: { C: 1, H: 3, S: 1, O: 2 },
};
