/** The 118 element symbols (IUPAC), for recognising formulas in labels. */
export const ELEMENT_SYMBOLS: ReadonlySet<string> = new Set((
  'H He Li Be B C N O F Ne Na Mg Al Si P S Cl Ar K Ca Sc Ti V Cr Mn Fe Co Ni Cu Zn Ga Ge As Se Br Kr ' +
  'Rb Sr Y Zr Nb Mo Tc Ru Rh Pd Ag Cd In Sn Sb Te I Xe Cs Ba La Ce Pr Nd Pm Sm Eu Gd Tb Dy Ho Er Tm Yb Lu ' +
  'Hf Ta W Re Os Ir Pt Au Hg Tl Pb Bi Po At Rn Fr Ra Ac Th Pa U Np Pu Am Cm Bk Cf Es Fm Md No Lr ' +
  'Rf Db Sg Bh Hs Mt Ds Rg Cn Nh Fl Mc Lv Ts Og'
).split(' '));

/** Group abbreviations chemists write inside formulas (common practice): PPh3, NEt3, OAc. */
export const GROUP_ABBREVIATIONS: ReadonlySet<string> = new Set(['Me', 'Et', 'Ph', 'Bu', 'Bn', 'Cy', 'Tf', 'Ms', 'Py', 'Mes', 'Dipp', 'Ad']);
