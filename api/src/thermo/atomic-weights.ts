/**
 * Atomic weights used for molar masses.
 *
 * Source: IUPAC/CIAAW standard atomic weights 2021 (Prohaska et al., Pure Appl. Chem. 94, 573,
 * 2022; table at ciaaw.org). For the elements whose standard atomic weight is an interval
 * (H, Li, B, C, N, O, Mg, Si, S, Cl, Ar, Br, Tl, Pb) the CIAAW *conventional* value is used;
 * for the others the value abridged to five significant figures. Elements without a standard
 * atomic weight carry the mass number of their longest-lived known isotope instead, marked
 * `kind: 'mass-number'` (not a CIAAW value: written from memory of the usual periodic-table
 * convention; Tc-97 and Tc-98 have nearly equal half-lives and tables list either).
 *
 * The isotope symbols D and T (²H, ³H) are accepted in formulas and carry their atomic masses
 * (from memory, AME: 2.014 101 78 and 3.016 049 28), marked `kind: 'isotope'`.
 */

export type AtomicWeightKind = 'conventional' | 'abridged' | 'mass-number' | 'isotope';

export interface AtomicWeight {
  readonly symbol: string;
  /** atomic number Z */
  readonly z: number;
  /** relative atomic mass Ar (dimensionless; numerically g/mol) */
  readonly weight: number;
  readonly kind: AtomicWeightKind;
}

type Row = readonly [symbol: string, weight: number, kind?: AtomicWeightKind];

// Rows in order of atomic number; kind defaults to 'abridged'.
const ROWS: readonly Row[] = [
  ['H', 1.008, 'conventional'], ['He', 4.0026], ['Li', 6.94, 'conventional'], ['Be', 9.0122],
  ['B', 10.81, 'conventional'], ['C', 12.011, 'conventional'], ['N', 14.007, 'conventional'],
  ['O', 15.999, 'conventional'], ['F', 18.998], ['Ne', 20.18], ['Na', 22.99],
  ['Mg', 24.305, 'conventional'], ['Al', 26.982], ['Si', 28.085, 'conventional'], ['P', 30.974],
  ['S', 32.06, 'conventional'], ['Cl', 35.45, 'conventional'], ['Ar', 39.95, 'conventional'],
  ['K', 39.098], ['Ca', 40.078], ['Sc', 44.956], ['Ti', 47.867], ['V', 50.942], ['Cr', 51.996],
  ['Mn', 54.938], ['Fe', 55.845], ['Co', 58.933], ['Ni', 58.693], ['Cu', 63.546], ['Zn', 65.38],
  ['Ga', 69.723], ['Ge', 72.63], ['As', 74.922], ['Se', 78.971], ['Br', 79.904, 'conventional'],
  ['Kr', 83.798], ['Rb', 85.468], ['Sr', 87.62], ['Y', 88.906], ['Zr', 91.224], ['Nb', 92.906],
  ['Mo', 95.95], ['Tc', 98, 'mass-number'], ['Ru', 101.07], ['Rh', 102.91], ['Pd', 106.42],
  ['Ag', 107.87], ['Cd', 112.41], ['In', 114.82], ['Sn', 118.71], ['Sb', 121.76], ['Te', 127.6],
  ['I', 126.9], ['Xe', 131.29], ['Cs', 132.91], ['Ba', 137.33], ['La', 138.91], ['Ce', 140.12],
  ['Pr', 140.91], ['Nd', 144.24], ['Pm', 145, 'mass-number'], ['Sm', 150.36], ['Eu', 151.96],
  ['Gd', 157.25], ['Tb', 158.93], ['Dy', 162.5], ['Ho', 164.93], ['Er', 167.26], ['Tm', 168.93],
  ['Yb', 173.05], ['Lu', 174.97], ['Hf', 178.49], ['Ta', 180.95], ['W', 183.84], ['Re', 186.21],
  ['Os', 190.23], ['Ir', 192.22], ['Pt', 195.08], ['Au', 196.97], ['Hg', 200.59],
  ['Tl', 204.38, 'conventional'], ['Pb', 207.2, 'conventional'], ['Bi', 208.98],
  ['Po', 209, 'mass-number'], ['At', 210, 'mass-number'], ['Rn', 222, 'mass-number'],
  ['Fr', 223, 'mass-number'], ['Ra', 226, 'mass-number'], ['Ac', 227, 'mass-number'],
  ['Th', 232.04], ['Pa', 231.04], ['U', 238.03], ['Np', 237, 'mass-number'],
  ['Pu', 244, 'mass-number'], ['Am', 243, 'mass-number'], ['Cm', 247, 'mass-number'],
  ['Bk', 247, 'mass-number'], ['Cf', 251, 'mass-number'], ['Es', 252, 'mass-number'],
  ['Fm', 257, 'mass-number'], ['Md', 258, 'mass-number'], ['No', 259, 'mass-number'],
  ['Lr', 266, 'mass-number'], ['Rf', 267, 'mass-number'], ['Db', 268, 'mass-number'],
  ['Sg', 269, 'mass-number'], ['Bh', 270, 'mass-number'], ['Hs', 269, 'mass-number'],
  ['Mt', 278, 'mass-number'], ['Ds', 281, 'mass-number'], ['Rg', 282, 'mass-number'],
  ['Cn', 285, 'mass-number'], ['Nh', 286, 'mass-number'], ['Fl', 289, 'mass-number'],
  ['Mc', 290, 'mass-number'], ['Lv', 293, 'mass-number'], ['Ts', 294, 'mass-number'],
  ['Og', 294, 'mass-number'],
];

const ISOTOPES: readonly AtomicWeight[] = [
  { symbol: 'D', z: 1, weight: 2.01410178, kind: 'isotope' },
  { symbol: 'T', z: 1, weight: 3.01604928, kind: 'isotope' },
];

/** Every element H (Z = 1) … Og (Z = 118), plus the isotopes D and T, by symbol. */
export const ATOMIC_WEIGHTS: ReadonlyMap<string, AtomicWeight> = new Map<string, AtomicWeight>([
  ...ROWS.map(([symbol, weight, kind], index): [string, AtomicWeight] => [
    symbol,
    { symbol, z: index + 1, weight, kind: kind ?? 'abridged' },
  ]),
  ...ISOTOPES.map((entry): [string, AtomicWeight] => [entry.symbol, entry]),
]);

/** The atomic-weight entry of a symbol, or undefined for an unknown symbol. */
export function atomicWeight(symbol: string): AtomicWeight | undefined {
  return ATOMIC_WEIGHTS.get(symbol);
}
