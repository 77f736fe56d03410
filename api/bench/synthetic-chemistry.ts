/**
 * The chemistry the benchmark data set is built from: elements with their reference states,
 * cations and anions for salts and aqueous ions, hydride parents for molecular inorganics, and
 * the names organic chemists use. The numbers are invented-but-plausible (rounded and perturbed
 * from the magnitudes in the usual tables): they give realistic magnitudes and spreads for the
 * benchmark and are never a check value.
 */

/** How the reference state of an element stores heat: the model behind its Cp(T) curve. */
export type ElementModel =
  | { kind: 'diatomic'; thetaVib: number; bondLength: number }
  | { kind: 'monatomic' }
  /** Einstein solid, θE / K, plus an electronic/anharmonic term γ·T / (J/(mol·K²)) per atom */
  | { kind: 'solid'; thetaE: number; gamma: number }
  | { kind: 'liquid'; cp298: number; s298: number };

export interface ElementData {
  symbol: string;
  name: string;
  /** the reference-state species: formula, phase, polymorph and atoms per formula unit */
  reference: { formula: string; phase: 'g' | 'l' | 'cr'; polymorph?: string; atoms: number };
  model: ElementModel;
  /** other crystalline modifications of the reference species (graphite → diamond) */
  otherPolymorphs?: string[];
  /** ΔfH° of the monatomic gas / (kJ/mol) */
  atomization: number;
}

const solid = (thetaE: number, gamma = 0.0025): ElementModel => ({ kind: 'solid', thetaE, gamma });

export const ELEMENTS: ElementData[] = [
  { symbol: 'H', name: 'hydrogen', reference: { formula: 'H2', phase: 'g', atoms: 2 }, model: { kind: 'diatomic', thetaVib: 6332, bondLength: 0.741 }, atomization: 218.0 },
  { symbol: 'N', name: 'nitrogen', reference: { formula: 'N2', phase: 'g', atoms: 2 }, model: { kind: 'diatomic', thetaVib: 3374, bondLength: 1.098 }, atomization: 472.7 },
  { symbol: 'O', name: 'oxygen', reference: { formula: 'O2', phase: 'g', atoms: 2 }, model: { kind: 'diatomic', thetaVib: 2256, bondLength: 1.208 }, atomization: 249.2 },
  { symbol: 'F', name: 'fluorine', reference: { formula: 'F2', phase: 'g', atoms: 2 }, model: { kind: 'diatomic', thetaVib: 1320, bondLength: 1.412 }, atomization: 79.4 },
  { symbol: 'Cl', name: 'chlorine', reference: { formula: 'Cl2', phase: 'g', atoms: 2 }, model: { kind: 'diatomic', thetaVib: 805, bondLength: 1.988 }, atomization: 121.3 },
  { symbol: 'Br', name: 'bromine', reference: { formula: 'Br2', phase: 'l', atoms: 2 }, model: { kind: 'liquid', cp298: 75.7, s298: 152.2 }, atomization: 111.9 },
  { symbol: 'I', name: 'iodine', reference: { formula: 'I2', phase: 'cr', atoms: 2 }, model: solid(75, 0.004), atomization: 106.8 },
  { symbol: 'Xe', name: 'xenon', reference: { formula: 'Xe', phase: 'g', atoms: 1 }, model: { kind: 'monatomic' }, atomization: 0 },
  { symbol: 'C', name: 'carbon', reference: { formula: 'C', phase: 'cr', polymorph: 'graphite', atoms: 1 }, model: solid(880, 0.001), otherPolymorphs: ['diamond'], atomization: 716.7 },
  { symbol: 'S', name: 'sulfur', reference: { formula: 'S', phase: 'cr', polymorph: 'rhombic', atoms: 1 }, model: solid(190), otherPolymorphs: ['monoclinic'], atomization: 277.2 },
  { symbol: 'P', name: 'phosphorus', reference: { formula: 'P', phase: 'cr', polymorph: 'white', atoms: 1 }, model: solid(210), otherPolymorphs: ['red'], atomization: 316.5 },
  { symbol: 'Si', name: 'silicon', reference: { formula: 'Si', phase: 'cr', atoms: 1 }, model: solid(480, 0.001), atomization: 450.0 },
  { symbol: 'B', name: 'boron', reference: { formula: 'B', phase: 'cr', atoms: 1 }, model: solid(950, 0.001), atomization: 565.0 },
  { symbol: 'Se', name: 'selenium', reference: { formula: 'Se', phase: 'cr', atoms: 1 }, model: solid(95), atomization: 227.1 },
  { symbol: 'Te', name: 'tellurium', reference: { formula: 'Te', phase: 'cr', atoms: 1 }, model: solid(110), atomization: 196.7 },
  { symbol: 'As', name: 'arsenic', reference: { formula: 'As', phase: 'cr', atoms: 1 }, model: solid(210), atomization: 302.5 },
  { symbol: 'Sb', name: 'antimony', reference: { formula: 'Sb', phase: 'cr', atoms: 1 }, model: solid(150), atomization: 262.3 },
  { symbol: 'Ge', name: 'germanium', reference: { formula: 'Ge', phase: 'cr', atoms: 1 }, model: solid(280, 0.0015), atomization: 372.0 },
  { symbol: 'Li', name: 'lithium', reference: { formula: 'Li', phase: 'cr', atoms: 1 }, model: solid(260), atomization: 159.3 },
  { symbol: 'Na', name: 'sodium', reference: { formula: 'Na', phase: 'cr', atoms: 1 }, model: solid(120), atomization: 107.5 },
  { symbol: 'K', name: 'potassium', reference: { formula: 'K', phase: 'cr', atoms: 1 }, model: solid(70), atomization: 89.0 },
  { symbol: 'Rb', name: 'rubidium', reference: { formula: 'Rb', phase: 'cr', atoms: 1 }, model: solid(42), atomization: 80.9 },
  { symbol: 'Cs', name: 'caesium', reference: { formula: 'Cs', phase: 'cr', atoms: 1 }, model: solid(30), atomization: 76.5 },
  { symbol: 'Be', name: 'beryllium', reference: { formula: 'Be', phase: 'cr', atoms: 1 }, model: solid(1000, 0.001), atomization: 324.0 },
  { symbol: 'Mg', name: 'magnesium', reference: { formula: 'Mg', phase: 'cr', atoms: 1 }, model: solid(300), atomization: 147.1 },
  { symbol: 'Ca', name: 'calcium', reference: { formula: 'Ca', phase: 'cr', atoms: 1 }, model: solid(175), atomization: 177.8 },
  { symbol: 'Sr', name: 'strontium', reference: { formula: 'Sr', phase: 'cr', atoms: 1 }, model: solid(110), atomization: 164.4 },
  { symbol: 'Ba', name: 'barium', reference: { formula: 'Ba', phase: 'cr', atoms: 1 }, model: solid(85), atomization: 180.0 },
  { symbol: 'Al', name: 'aluminium', reference: { formula: 'Al', phase: 'cr', atoms: 1 }, model: solid(320), atomization: 330.0 },
  { symbol: 'Ga', name: 'gallium', reference: { formula: 'Ga', phase: 'cr', atoms: 1 }, model: solid(240), atomization: 272.0 },
  { symbol: 'In', name: 'indium', reference: { formula: 'In', phase: 'cr', atoms: 1 }, model: solid(80), atomization: 243.0 },
  { symbol: 'Tl', name: 'thallium', reference: { formula: 'Tl', phase: 'cr', atoms: 1 }, model: solid(60), atomization: 182.2 },
  { symbol: 'Sc', name: 'scandium', reference: { formula: 'Sc', phase: 'cr', atoms: 1 }, model: solid(270), atomization: 377.8 },
  { symbol: 'Y', name: 'yttrium', reference: { formula: 'Y', phase: 'cr', atoms: 1 }, model: solid(210), atomization: 421.3 },
  { symbol: 'La', name: 'lanthanum', reference: { formula: 'La', phase: 'cr', atoms: 1 }, model: solid(107), atomization: 431.0 },
  { symbol: 'Ce', name: 'cerium', reference: { formula: 'Ce', phase: 'cr', atoms: 1 }, model: solid(110), atomization: 423.0 },
  { symbol: 'Ti', name: 'titanium', reference: { formula: 'Ti', phase: 'cr', atoms: 1 }, model: solid(315), atomization: 473.0 },
  { symbol: 'Zr', name: 'zirconium', reference: { formula: 'Zr', phase: 'cr', atoms: 1 }, model: solid(218), atomization: 610.0 },
  { symbol: 'V', name: 'vanadium', reference: { formula: 'V', phase: 'cr', atoms: 1 }, model: solid(285), atomization: 514.0 },
  { symbol: 'Cr', name: 'chromium', reference: { formula: 'Cr', phase: 'cr', atoms: 1 }, model: solid(470), atomization: 397.0 },
  { symbol: 'Mo', name: 'molybdenum', reference: { formula: 'Mo', phase: 'cr', atoms: 1 }, model: solid(340), atomization: 659.0 },
  { symbol: 'W', name: 'tungsten', reference: { formula: 'W', phase: 'cr', atoms: 1 }, model: solid(300), atomization: 851.0 },
  { symbol: 'Mn', name: 'manganese', reference: { formula: 'Mn', phase: 'cr', atoms: 1 }, model: solid(305), atomization: 283.3 },
  { symbol: 'Fe', name: 'iron', reference: { formula: 'Fe', phase: 'cr', atoms: 1 }, model: solid(350), atomization: 416.3 },
  { symbol: 'Co', name: 'cobalt', reference: { formula: 'Co', phase: 'cr', atoms: 1 }, model: solid(335), atomization: 424.7 },
  { symbol: 'Ni', name: 'nickel', reference: { formula: 'Ni', phase: 'cr', atoms: 1 }, model: solid(335), atomization: 429.7 },
  { symbol: 'Cu', name: 'copper', reference: { formula: 'Cu', phase: 'cr', atoms: 1 }, model: solid(257), atomization: 337.4 },
  { symbol: 'Ag', name: 'silver', reference: { formula: 'Ag', phase: 'cr', atoms: 1 }, model: solid(170), atomization: 284.9 },
  { symbol: 'Zn', name: 'zinc', reference: { formula: 'Zn', phase: 'cr', atoms: 1 }, model: solid(245), atomization: 130.4 },
  { symbol: 'Cd', name: 'cadmium', reference: { formula: 'Cd', phase: 'cr', atoms: 1 }, model: solid(157), atomization: 111.8 },
  { symbol: 'Hg', name: 'mercury', reference: { formula: 'Hg', phase: 'l', atoms: 1 }, model: { kind: 'liquid', cp298: 28.0, s298: 75.9 }, atomization: 61.4 },
  { symbol: 'Sn', name: 'tin', reference: { formula: 'Sn', phase: 'cr', polymorph: 'white', atoms: 1 }, model: solid(150), otherPolymorphs: ['grey'], atomization: 301.2 },
  { symbol: 'Pb', name: 'lead', reference: { formula: 'Pb', phase: 'cr', atoms: 1 }, model: solid(79), atomization: 195.2 },
  { symbol: 'Bi', name: 'bismuth', reference: { formula: 'Bi', phase: 'cr', atoms: 1 }, model: solid(89), atomization: 207.1 },
  { symbol: 'U', name: 'uranium', reference: { formula: 'U', phase: 'cr', atoms: 1 }, model: solid(155), atomization: 533.0 },
];

/**
 * A cation of the salt and aqueous-ion generators: formula, name, charge, and its invented
 * contributions ΔfH°(aq) / (kJ/mol) and S°(aq) / (J/(mol·K)) (kept positive: the catalogue's
 * CHECK constraints refuse S° ≤ 0).
 */
export interface Ion {
  formula: string;
  name: string;
  /** older name, kept as a synonym (ferrous, cupric, sulphate) */
  oldName?: string;
  charge: number;
  hAq: number;
  sAq: number;
  /** polyatomic: written in parentheses when more than one is needed */
  polyatomic: boolean;
  /** anions that exist only in solids (oxide, nitride, hydride): no aqueous phase */
  solidOnly?: boolean;
}

const cation = (formula: string, name: string, charge: number, hAq: number, sAq: number, oldName?: string): Ion => ({
  formula, name, charge, hAq, sAq, oldName, polyatomic: formula === 'NH4',
});

export const CATIONS: Ion[] = [
  cation('Li', 'lithium', 1, -278.5, 13.4),
  cation('Na', 'sodium', 1, -240.1, 59.0),
  cation('K', 'potassium', 1, -252.4, 102.5),
  cation('Rb', 'rubidium', 1, -251.2, 121.5),
  cation('Cs', 'caesium', 1, -258.3, 133.1, 'cesium'),
  cation('NH4', 'ammonium', 1, -132.5, 113.4),
  cation('Ag', 'silver', 1, 105.6, 72.7),
  cation('Cu', 'copper(I)', 1, 71.7, 40.6, 'cuprous'),
  cation('Tl', 'thallium(I)', 1, 5.4, 125.5, 'thallous'),
  cation('Be', 'beryllium', 2, -382.8, 12.0),
  cation('Mg', 'magnesium', 2, -466.9, 18.0),
  cation('Ca', 'calcium', 2, -542.8, 23.0),
  cation('Sr', 'strontium', 2, -545.8, 32.6),
  cation('Ba', 'barium', 2, -537.6, 9.6),
  cation('Mn', 'manganese(II)', 2, -220.8, 26.0, 'manganous'),
  cation('Fe', 'iron(II)', 2, -89.1, 17.0, 'ferrous'),
  cation('Co', 'cobalt(II)', 2, -58.2, 13.0, 'cobaltous'),
  cation('Ni', 'nickel(II)', 2, -54.0, 12.9, 'nickelous'),
  cation('Cu', 'copper(II)', 2, 64.8, 19.9, 'cupric'),
  cation('Zn', 'zinc', 2, -153.9, 11.2),
  cation('Cd', 'cadmium', 2, -75.9, 27.1),
  cation('Hg', 'mercury(II)', 2, 171.1, 32.2, 'mercuric'),
  cation('Sn', 'tin(II)', 2, -8.8, 17.0, 'stannous'),
  cation('Pb', 'lead(II)', 2, -1.7, 10.5, 'plumbous'),
  cation('Al', 'aluminium', 3, -531.0, 8.0, 'aluminum'),
  cation('Ga', 'gallium', 3, -211.7, 9.0),
  cation('In', 'indium', 3, -105.0, 11.0),
  cation('Sc', 'scandium', 3, -614.2, 10.0),
  cation('Y', 'yttrium', 3, -723.4, 12.0),
  cation('La', 'lanthanum', 3, -707.1, 15.0),
  cation('Ce', 'cerium(III)', 3, -696.2, 14.0, 'cerous'),
  cation('Cr', 'chromium(III)', 3, -256.0, 10.0, 'chromic'),
  cation('Fe', 'iron(III)', 3, -48.5, 9.0, 'ferric'),
  cation('Co', 'cobalt(III)', 3, 92.0, 8.0, 'cobaltic'),
  cation('Bi', 'bismuth(III)', 3, 82.8, 15.0),
  cation('V', 'vanadium(III)', 3, -259.0, 10.0),
  cation('Ti', 'titanium(IV)', 4, -630.0, 6.0),
  cation('Zr', 'zirconium(IV)', 4, -700.0, 6.0),
  cation('Sn', 'tin(IV)', 4, 30.5, 7.0, 'stannic'),
  cation('U', 'uranium(IV)', 4, -591.2, 6.0),
];

const anion = (formula: string, name: string, charge: number, hAq: number, sAq: number, options: { oldName?: string; solidOnly?: boolean } = {}): Ion => ({
  formula, name, charge, hAq, sAq, polyatomic: /[A-Z].*[A-Z]|\d/.test(formula), ...options,
});

export const ANIONS: Ion[] = [
  anion('F', 'fluoride', -1, -332.6, 14.0),
  anion('Cl', 'chloride', -1, -167.2, 56.5),
  anion('Br', 'bromide', -1, -121.6, 82.4),
  anion('I', 'iodide', -1, -55.2, 111.3),
  anion('OH', 'hydroxide', -1, -230.0, 10.8),
  anion('NO3', 'nitrate', -1, -205.0, 146.4),
  anion('NO2', 'nitrite', -1, -104.6, 123.0),
  anion('ClO4', 'perchlorate', -1, -129.3, 182.0),
  anion('ClO3', 'chlorate', -1, -104.0, 162.3),
  anion('BrO3', 'bromate', -1, -67.1, 161.7),
  anion('IO3', 'iodate', -1, -221.3, 118.4),
  anion('MnO4', 'permanganate', -1, -541.4, 191.2),
  anion('HCO3', 'hydrogencarbonate', -1, -692.0, 91.2, { oldName: 'bicarbonate' }),
  anion('HSO4', 'hydrogensulfate', -1, -887.3, 131.8, { oldName: 'bisulphate' }),
  anion('H2PO4', 'dihydrogenphosphate', -1, -1296.3, 90.4),
  anion('CN', 'cyanide', -1, 150.6, 94.1),
  anion('SCN', 'thiocyanate', -1, 76.4, 144.3),
  anion('CH3COO', 'acetate', -1, -486.0, 86.6, { oldName: 'ethanoate' }),
  anion('HCOO', 'formate', -1, -425.6, 92.0, { oldName: 'methanoate' }),
  anion('BO2', 'metaborate', -1, -772.4, 37.2),
  anion('HS', 'hydrogensulfide', -1, -17.6, 62.8, { oldName: 'bisulphide' }),
  anion('SO4', 'sulfate', -2, -909.3, 20.1, { oldName: 'sulphate' }),
  anion('SO3', 'sulfite', -2, -635.5, 29.0, { oldName: 'sulphite' }),
  anion('S2O3', 'thiosulfate', -2, -652.3, 67.0, { oldName: 'hyposulphite' }),
  anion('CO3', 'carbonate', -2, -677.1, 6.0),
  anion('CrO4', 'chromate', -2, -881.2, 50.2),
  anion('Cr2O7', 'dichromate', -2, -1490.3, 261.9),
  anion('C2O4', 'oxalate', -2, -825.1, 45.6),
  anion('HPO4', 'hydrogenphosphate', -2, -1292.1, 8.0),
  anion('SiO3', 'metasilicate', -2, -1130.0, 10.0),
  anion('MoO4', 'molybdate', -2, -997.9, 27.2),
  anion('WO4', 'tungstate', -2, -1075.7, 41.8),
  anion('SeO4', 'selenate', -2, -599.1, 54.0),
  anion('S', 'sulfide', -2, 33.1, 14.0, { oldName: 'sulphide' }),
  anion('Se', 'selenide', -2, 150.0, 20.0),
  anion('PO4', 'phosphate', -3, -1277.4, 20.0, { oldName: 'orthophosphate' }),
  anion('AsO4', 'arsenate', -3, -888.1, 15.0),
  anion('O', 'oxide', -2, -140.0, 8.0, { solidOnly: true }),
  anion('N', 'nitride', -3, 650.0, 10.0, { solidOnly: true }),
  anion('H', 'hydride', -1, 188.0, 10.0, { solidOnly: true }),
  anion('P', 'phosphide', -3, 600.0, 12.0, { solidOnly: true }),
  anion('Te', 'telluride', -2, 160.0, 22.0, { solidOnly: true }),
];

export const HYDRATE_NAMES = ['', 'monohydrate', 'dihydrate', 'trihydrate', 'tetrahydrate', 'pentahydrate', 'hexahydrate',
  'heptahydrate', 'octahydrate', 'nonahydrate', 'decahydrate', 'undecahydrate', 'dodecahydrate'];

/** Central atoms of molecular inorganics with the valences they show, and the parent hydride's name at each. */
export const HYDRIDE_PARENTS: { central: string; valence: number; parent: string }[] = [
  { central: 'B', valence: 3, parent: 'borane' },
  { central: 'Si', valence: 4, parent: 'silane' },
  { central: 'Ge', valence: 4, parent: 'germane' },
  { central: 'Sn', valence: 4, parent: 'stannane' },
  { central: 'N', valence: 3, parent: 'azane' },
  { central: 'P', valence: 3, parent: 'phosphane' },
  { central: 'P', valence: 5, parent: 'λ5-phosphane' },
  { central: 'As', valence: 3, parent: 'arsane' },
  { central: 'As', valence: 5, parent: 'λ5-arsane' },
  { central: 'Sb', valence: 3, parent: 'stibane' },
  { central: 'Sb', valence: 5, parent: 'λ5-stibane' },
  { central: 'S', valence: 2, parent: 'sulfane' },
  { central: 'S', valence: 4, parent: 'λ4-sulfane' },
  { central: 'S', valence: 6, parent: 'λ6-sulfane' },
  { central: 'Se', valence: 2, parent: 'selane' },
  { central: 'Se', valence: 4, parent: 'λ4-selane' },
  { central: 'Se', valence: 6, parent: 'λ6-selane' },
  { central: 'Te', valence: 4, parent: 'λ4-tellane' },
  { central: 'Te', valence: 6, parent: 'λ6-tellane' },
];

/** Substituents on a hydride parent, in alphabetical order of their prefixes. */
export const HALIDE_LIGANDS: { symbol: string; prefix: string }[] = [
  { symbol: 'Br', prefix: 'bromo' },
  { symbol: 'Cl', prefix: 'chloro' },
  { symbol: 'F', prefix: 'fluoro' },
  { symbol: 'I', prefix: 'iodo' },
];

export const CHAIN_STEMS = ['', 'meth', 'eth', 'prop', 'but', 'pent', 'hex', 'hept', 'oct', 'non', 'dec', 'undec', 'dodec', 'tridec',
  'tetradec', 'pentadec', 'hexadec', 'heptadec', 'octadec', 'nonadec', 'icos', 'henicos', 'docos', 'tricos', 'tetracos',
  'pentacos', 'hexacos', 'heptacos', 'octacos', 'nonacos', 'triacont'];

export const MULTIPLIERS = ['', '', 'di', 'tri', 'tetra', 'penta', 'hexa', 'hepta', 'octa', 'nona', 'deca', 'undeca', 'dodeca'];

/**
 * Small molecules every catalogue has, with fixed names and gas-phase values close to the usual
 * tables (so that combustion enthalpies come out realistic) (their Hill formulas are kept free of
 * generated isomers, so that equations such as CH4(g) + 2 O2(g) → CO2(g) + 2 H2O(g) resolve).
 */
export interface CoreMolecule {
  formula: string;
  name: string;
  synonyms: string[];
  /** ideal gas at 298.15 K: ΔfH° / (kJ/mol) and S° / (J/(mol·K)), rounded from the usual tables */
  gas: { dfH: number; S: number };
  /** ΔvapH / (kJ/mol) */
  vapH: number;
  phases: ('g' | 'l' | 'cr')[];
}

export const CORE_MOLECULES: CoreMolecule[] = [
  { formula: 'H2O', name: 'water', synonyms: ['oxidane', 'dihydrogen monoxide'], gas: { dfH: -241.8, S: 188.8 }, vapH: 44.0, phases: ['g', 'l', 'cr'] },
  { formula: 'CO2', name: 'carbon dioxide', synonyms: ['carbonic anhydride'], gas: { dfH: -393.5, S: 213.8 }, vapH: 16.0, phases: ['g', 'cr'] },
  { formula: 'CO', name: 'carbon monoxide', synonyms: [], gas: { dfH: -110.5, S: 197.7 }, vapH: 6.0, phases: ['g', 'l'] },
  { formula: 'CH4', name: 'methane', synonyms: ['marsh gas'], gas: { dfH: -74.6, S: 186.3 }, vapH: 8.2, phases: ['g', 'l'] },
  { formula: 'NH3', name: 'ammonia', synonyms: ['azane'], gas: { dfH: -45.9, S: 192.8 }, vapH: 23.3, phases: ['g', 'l'] },
  { formula: 'NO', name: 'nitric oxide', synonyms: ['nitrogen monoxide'], gas: { dfH: 91.3, S: 210.8 }, vapH: 13.8, phases: ['g', 'l'] },
  { formula: 'NO2', name: 'nitrogen dioxide', synonyms: [], gas: { dfH: 33.1, S: 240.0 }, vapH: 20.0, phases: ['g', 'l'] },
  { formula: 'N2O', name: 'nitrous oxide', synonyms: ['dinitrogen monoxide'], gas: { dfH: 81.6, S: 220.0 }, vapH: 16.5, phases: ['g', 'l'] },
  { formula: 'SO2', name: 'sulfur dioxide', synonyms: ['sulphur dioxide'], gas: { dfH: -296.8, S: 248.2 }, vapH: 24.9, phases: ['g', 'l'] },
  { formula: 'SO3', name: 'sulfur trioxide', synonyms: ['sulphur trioxide'], gas: { dfH: -395.7, S: 256.8 }, vapH: 43.1, phases: ['g', 'l', 'cr'] },
  { formula: 'H2S', name: 'hydrogen sulfide', synonyms: ['sulfane'], gas: { dfH: -20.6, S: 205.8 }, vapH: 18.7, phases: ['g', 'l'] },
  { formula: 'HCl', name: 'hydrogen chloride', synonyms: [], gas: { dfH: -92.3, S: 186.9 }, vapH: 16.2, phases: ['g', 'l'] },
  { formula: 'HF', name: 'hydrogen fluoride', synonyms: [], gas: { dfH: -273.3, S: 173.8 }, vapH: 30.0, phases: ['g', 'l'] },
  { formula: 'HBr', name: 'hydrogen bromide', synonyms: [], gas: { dfH: -36.3, S: 198.7 }, vapH: 17.6, phases: ['g', 'l'] },
  { formula: 'H2O2', name: 'hydrogen peroxide', synonyms: [], gas: { dfH: -136.1, S: 232.7 }, vapH: 51.6, phases: ['g', 'l'] },
  { formula: 'C2H6', name: 'ethane', synonyms: [], gas: { dfH: -84.0, S: 229.2 }, vapH: 14.7, phases: ['g', 'l'] },
  { formula: 'C2H4', name: 'ethene', synonyms: ['ethylene'], gas: { dfH: 52.4, S: 219.3 }, vapH: 13.5, phases: ['g', 'l'] },
  { formula: 'C2H2', name: 'ethyne', synonyms: ['acetylene'], gas: { dfH: 227.4, S: 200.9 }, vapH: 17.0, phases: ['g', 'l'] },
  { formula: 'C3H8', name: 'propane', synonyms: [], gas: { dfH: -104.7, S: 270.3 }, vapH: 19.0, phases: ['g', 'l'] },
  { formula: 'CH3OH', name: 'methanol', synonyms: ['methyl alcohol'], gas: { dfH: -201.0, S: 239.9 }, vapH: 37.4, phases: ['g', 'l'] },
  { formula: 'C2H5OH', name: 'ethanol', synonyms: ['ethyl alcohol'], gas: { dfH: -234.8, S: 281.6 }, vapH: 42.3, phases: ['g', 'l'] },
  { formula: 'C6H6', name: 'benzene', synonyms: [], gas: { dfH: 82.9, S: 269.2 }, vapH: 33.9, phases: ['g', 'l', 'cr'] },
  { formula: 'HCN', name: 'hydrogen cyanide', synonyms: ['formonitrile'], gas: { dfH: 135.1, S: 201.8 }, vapH: 25.2, phases: ['g', 'l'] },
  { formula: 'O3', name: 'ozone', synonyms: ['trioxygen'], gas: { dfH: 142.7, S: 238.9 }, vapH: 15.2, phases: ['g', 'l'] },
];
