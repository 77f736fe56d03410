import { NASA_TM_4513_SETS } from '../api/src/reference-data/nasa-tm-4513';
import type { Quantity, TransitionKind } from '../api/src/values/value-vocabulary';
import type { PhaseCode } from '../api/src/species/phase-code';

/**
 * The reference set: published values, each row citing its source.
 *
 * Where the numbers come from: ../shared/reference-data/published-values.md, which says how sure
 * each number is — "confirmed" (read in a document reproducing the publication), "corroborated"
 * (seen in a copy that does not name its source) or "from memory". Every row below carries that
 * reading in `reading` and in the stored value's notes. A value from memory is only included when a
 * second published table in that file can check it; the check is in
 * api/src/db/reference-set.spec.ts. Values from memory without such a second table (NBS Cp° of
 * C2H6, CH3OH, C2H5OH and CO2; S° of O(g), N(g) and S(cr); all of H(g)) are left out.
 *
 * All values at T = 298.15 K and p° = 1 bar (100 000 Pa) unless a row says otherwise.
 * Bibliographic details beyond what published-values.md states (full titles, author lists,
 * publishers) are from memory and marked so in each source's notes. No DOI is given for these
 * sources: none could be confirmed here, and an invented DOI would be worse than none.
 */

export interface ReferenceSource {
  key: string;
  title: string;
  year: number;
  csl: Record<string, unknown>;
  notes: string;
  /** lower = preferred when the editor picks the recommended value among sources */
  priority: number;
}

export const REFERENCE_SOURCES: ReferenceSource[] = [
  {
    key: 'codata-1989',
    title: 'CODATA Key Values for Thermodynamics',
    year: 1989,
    priority: 1,
    csl: {
      type: 'book',
      title: 'CODATA Key Values for Thermodynamics',
      author: [
        { family: 'Cox', given: 'J. D.' },
        { family: 'Wagman', given: 'D. D.' },
        { family: 'Medvedev', given: 'V. A.' },
      ],
      publisher: 'Hemisphere Publishing Corp.',
      'publisher-place': 'New York',
      issued: { 'date-parts': [[1989]] },
    },
    notes:
      'Authors, title and year as in published-values.md; publisher and place from memory. ' +
      'The ± of this table are stored as expanded uncertainties with k = 2 (about 95 %): that reading of the ' +
      "book's introduction is from memory and should be verified against the book.",
  },
  {
    key: 'nbs-1982',
    title: 'The NBS tables of chemical thermodynamic properties: selected values for inorganic and C1 and C2 organic substances in SI units',
    year: 1982,
    priority: 3,
    csl: {
      type: 'article-journal',
      title: 'The NBS tables of chemical thermodynamic properties: selected values for inorganic and C1 and C2 organic substances in SI units',
      author: [
        { family: 'Wagman', given: 'D. D.' },
        { family: 'Evans', given: 'W. H.' },
        { family: 'Parker', given: 'V. B.' },
        { family: 'Schumm', given: 'R. H.' },
        { family: 'Halow', given: 'I.' },
        { family: 'Bailey', given: 'S. M.' },
        { family: 'Churney', given: 'K. L.' },
        { family: 'Nuttall', given: 'R. L.' },
      ],
      'container-title': 'Journal of Physical and Chemical Reference Data',
      volume: '11',
      'collection-title': 'Supplement No. 2',
      issued: { 'date-parts': [[1982]] },
    },
    notes:
      'Journal, volume, supplement and year as in published-values.md; the full title and the author list after Wagman are from memory. ' +
      'The tables print no uncertainties; they are consistent only to their last printed digit.',
  },
  {
    key: 'janaf-1998',
    title: 'NIST-JANAF Thermochemical Tables, Fourth Edition',
    year: 1998,
    priority: 2,
    csl: {
      type: 'book',
      title: 'NIST-JANAF Thermochemical Tables, Fourth Edition',
      author: [{ family: 'Chase', given: 'M. W.', suffix: 'Jr.' }],
      'collection-title': 'Journal of Physical and Chemical Reference Data, Monograph 9',
      issued: { 'date-parts': [[1998]] },
    },
    notes: 'Author, monograph number and year as in published-values.md; the given names are from memory.',
  },
  {
    key: 'nasa-tm-4513',
    title: 'Coefficients for Calculating Thermodynamic and Transport Properties of Individual Species',
    year: 1993,
    priority: 2,
    csl: {
      type: 'report',
      title: 'Coefficients for Calculating Thermodynamic and Transport Properties of Individual Species',
      author: [
        { family: 'McBride', given: 'B. J.' },
        { family: 'Gordon', given: 'S.' },
        { family: 'Reno', given: 'M. A.' },
      ],
      publisher: 'National Aeronautics and Space Administration',
      number: 'NASA TM-4513',
      issued: { 'date-parts': [[1993]] },
    },
    notes:
      'Authors, report number and year as in published-values.md; the title is from memory. ' +
      'Coefficients as reproduced in a public copy that attributes them to TM-4513, not checked against the report itself.',
  },
];

export interface ReferencePhase {
  phase: PhaseCode;
  polymorph?: string;
  referenceState?: boolean;
}

export interface ReferenceSpecies {
  key: string;
  /** formula as entered; composition, Hill formula and molar mass come from the engine's parser */
  formula: string;
  name: string;
  synonyms: string[];
  casRn?: string;
  inchi?: string;
  inchikey?: string;
  smiles?: string;
  phases: ReferencePhase[];
}

/**
 * Species of the reference set. Identifiers (CAS RN, InChI, InChIKey, SMILES) are from memory;
 * the CAS check digits are verified by the database on load, and the InChIKey layout too.
 */
export const REFERENCE_SPECIES: ReferenceSpecies[] = [
  { key: 'H2', formula: 'H2', name: 'hydrogen', synonyms: ['dihydrogen', 'molecular hydrogen'], casRn: '1333-74-0',
    inchi: 'InChI=1S/H2/h1H', inchikey: 'UFHFLCQGNIYNRP-UHFFFAOYSA-N', smiles: '[HH]', phases: [{ phase: 'g', referenceState: true }] },
  { key: 'O2', formula: 'O2', name: 'oxygen', synonyms: ['dioxygen', 'molecular oxygen'], casRn: '7782-44-7',
    inchi: 'InChI=1S/O2/c1-2', inchikey: 'MYMOFIZGZYHOMD-UHFFFAOYSA-N', smiles: 'O=O', phases: [{ phase: 'g', referenceState: true }] },
  { key: 'N2', formula: 'N2', name: 'nitrogen', synonyms: ['dinitrogen', 'molecular nitrogen'], casRn: '7727-37-9',
    inchi: 'InChI=1S/N2/c1-2', inchikey: 'IJGRMHOSHXDMSA-UHFFFAOYSA-N', smiles: 'N#N', phases: [{ phase: 'g', referenceState: true }] },
  { key: 'Cl2', formula: 'Cl2', name: 'chlorine', synonyms: ['dichlorine'], casRn: '7782-50-5',
    inchi: 'InChI=1S/Cl2/c1-2', inchikey: 'KZBUYRJDOAKODT-UHFFFAOYSA-N', smiles: 'ClCl', phases: [{ phase: 'g', referenceState: true }] },
  { key: 'C', formula: 'C', name: 'carbon', synonyms: ['graphite', 'atomic carbon'], casRn: '7440-44-0',
    inchi: 'InChI=1S/C', inchikey: 'OKTJSMMVPCPJKN-UHFFFAOYSA-N', smiles: '[C]',
    phases: [{ phase: 'cr', polymorph: 'graphite', referenceState: true }, { phase: 'g' }] },
  { key: 'S', formula: 'S', name: 'sulfur', synonyms: ['sulphur', 'rhombic sulfur'], casRn: '7704-34-9',
    inchi: 'InChI=1S/S', inchikey: 'NINIDFKCEFEMDL-UHFFFAOYSA-N', smiles: '[S]', phases: [{ phase: 'cr', polymorph: 'rhombic', referenceState: true }] },
  { key: 'O', formula: 'O', name: 'oxygen atom', synonyms: ['atomic oxygen'], casRn: '17778-80-2',
    inchi: 'InChI=1S/O', inchikey: 'QVGXLLKOCUKJST-UHFFFAOYSA-N', smiles: '[O]', phases: [{ phase: 'g' }] },
  { key: 'N', formula: 'N', name: 'nitrogen atom', synonyms: ['atomic nitrogen'], casRn: '17778-88-0',
    inchi: 'InChI=1S/N', inchikey: 'QJGQUHMNIGDVPM-UHFFFAOYSA-N', smiles: '[N]', phases: [{ phase: 'g' }] },
  { key: 'H2O', formula: 'H2O', name: 'water', synonyms: ['dihydrogen monoxide', 'steam'], casRn: '7732-18-5',
    inchi: 'InChI=1S/H2O/h1H2', inchikey: 'XLYOFNOQVPJJNP-UHFFFAOYSA-N', smiles: 'O', phases: [{ phase: 'l' }, { phase: 'g' }] },
  { key: 'CO2', formula: 'CO2', name: 'carbon dioxide', synonyms: ['carbonic anhydride'], casRn: '124-38-9',
    inchi: 'InChI=1S/CO2/c2-1-3', inchikey: 'CURLTUGMZLYLDI-UHFFFAOYSA-N', smiles: 'O=C=O', phases: [{ phase: 'g' }] },
  { key: 'CO', formula: 'CO', name: 'carbon monoxide', synonyms: ['carbonic oxide'], casRn: '630-08-0',
    inchi: 'InChI=1S/CO/c1-2', inchikey: 'UGFAIRIUMAVXCW-UHFFFAOYSA-N', smiles: '[C-]#[O+]', phases: [{ phase: 'g' }] },
  { key: 'NH3', formula: 'NH3', name: 'ammonia', synonyms: ['azane'], casRn: '7664-41-7',
    inchi: 'InChI=1S/H3N/h1H3', inchikey: 'QGZKDVFQNNGYKY-UHFFFAOYSA-N', smiles: 'N', phases: [{ phase: 'g' }] },
  { key: 'CH4', formula: 'CH4', name: 'methane', synonyms: ['marsh gas'], casRn: '74-82-8',
    inchi: 'InChI=1S/CH4/h1H4', inchikey: 'VNWKTOKETHGBQD-UHFFFAOYSA-N', smiles: 'C', phases: [{ phase: 'g' }] },
  { key: 'C2H6', formula: 'C2H6', name: 'ethane', synonyms: ['dimethyl'], casRn: '74-84-0',
    inchi: 'InChI=1S/C2H6/c1-2/h1-2H3', inchikey: 'OTMSDBZUPAUEDD-UHFFFAOYSA-N', smiles: 'CC', phases: [{ phase: 'g' }] },
  { key: 'CH3OH', formula: 'CH3OH', name: 'methanol', synonyms: ['methyl alcohol', 'wood alcohol'], casRn: '67-56-1',
    inchi: 'InChI=1S/CH4O/c1-2/h2H,1H3', inchikey: 'OKKJLVBELUTLKV-UHFFFAOYSA-N', smiles: 'CO', phases: [{ phase: 'l' }, { phase: 'g' }] },
  { key: 'C2H5OH', formula: 'C2H5OH', name: 'ethanol', synonyms: ['ethyl alcohol'], casRn: '64-17-5',
    inchi: 'InChI=1S/C2H6O/c1-2-3/h3H,2H2,1H3', inchikey: 'LFQSCWFLJHTTHZ-UHFFFAOYSA-N', smiles: 'CCO', phases: [{ phase: 'l' }, { phase: 'g' }] },
];

export type ReferenceRelease = '2026.1' | '2026.2';

export interface ReferenceValue {
  /** stable key: source:species(phase):quantity */
  key: string;
  species: string;
  /** phase code, or "cr, graphite" style with polymorph */
  phase: string;
  quantity: Quantity;
  transitionKind?: TransitionKind;
  /** as printed */
  value: string;
  /** ± as printed; absent when the source prints none */
  uncertainty?: string;
  unit: 'kJ/mol' | 'J/(mol·K)';
  source: string;
  /** release in which this version first appears */
  release: ReferenceRelease;
  /** how sure the number is, from published-values.md */
  reading: string;
  notes?: string;
}

const KJ = 'kJ/mol' as const;
const JK = 'J/(mol·K)' as const;

/** CODATA 1989 ΔfH° (and S° where given), uncertainties expanded (k = 2, see source notes). */
function codata(species: string, phase: string, dfH: [string, string?], entropy: [string, string] | undefined, reading: string, release: ReferenceRelease = '2026.1'): ReferenceValue[] {
  const rows: ReferenceValue[] = [{
    key: `codata-1989:${species}(${phase}):dfH`, species, phase, quantity: 'dfH', value: dfH[0], uncertainty: dfH[1], unit: KJ,
    source: 'codata-1989', release, reading,
    notes: dfH[0] === '0' ? 'Zero by definition: the reference state of the element.' : undefined,
  }];
  if (entropy) {
    rows.push({
      key: `codata-1989:${species}(${phase}):S`, species, phase, quantity: 'S', value: entropy[0], uncertainty: entropy[1], unit: JK,
      source: 'codata-1989', release, reading,
    });
  }
  return rows;
}

/** NBS 1982 ΔfH°, ΔfG°, S° and (where checkable) Cp°; the tables print no uncertainties. */
function nbs(species: string, phase: string, dfH: string, dfG: string, entropy: string, cp: string | undefined, reading: string, cpReading?: string): ReferenceValue[] {
  const at = `${species}(${phase})`;
  const rows: ReferenceValue[] = [
    { key: `nbs-1982:${at}:dfH`, species, phase, quantity: 'dfH', value: dfH, unit: KJ, source: 'nbs-1982', release: '2026.1', reading },
    { key: `nbs-1982:${at}:dfG`, species, phase, quantity: 'dfG', value: dfG, unit: KJ, source: 'nbs-1982', release: '2026.1', reading },
    { key: `nbs-1982:${at}:S`, species, phase, quantity: 'S', value: entropy, unit: JK, source: 'nbs-1982', release: '2026.1', reading },
  ];
  if (cp) {
    rows.push({ key: `nbs-1982:${at}:Cp`, species, phase, quantity: 'Cp', value: cp, unit: JK, source: 'nbs-1982', release: '2026.1', reading: cpReading ?? reading });
  }
  return rows;
}

/** JANAF 1998 rows at 298.15 K (confirmed in two independent copies); added in release 2026.2. */
function janaf(species: string, phase: string, cp: string, entropy: string, dfH?: string, dfG?: string): ReferenceValue[] {
  const at = `${species}(${phase})`;
  const reading = 'confirmed in two independent copies';
  const rows: ReferenceValue[] = [
    { key: `janaf-1998:${at}:Cp`, species, phase, quantity: 'Cp', value: cp, unit: JK, source: 'janaf-1998', release: '2026.2', reading },
    { key: `janaf-1998:${at}:S`, species, phase, quantity: 'S', value: entropy, unit: JK, source: 'janaf-1998', release: '2026.2', reading },
  ];
  if (dfH) rows.push({ key: `janaf-1998:${at}:dfH`, species, phase, quantity: 'dfH', value: dfH, unit: KJ, source: 'janaf-1998', release: '2026.2', reading });
  if (dfG) rows.push({ key: `janaf-1998:${at}:dfG`, species, phase, quantity: 'dfG', value: dfG, unit: KJ, source: 'janaf-1998', release: '2026.2', reading });
  return rows;
}

const NBS_CP_FROM_MEMORY = 'corroborated; Cp° from memory, checked against JANAF 1998 (confirmed) in reference-set.spec';

export const REFERENCE_VALUES: ReferenceValue[] = [
  // CODATA Key Values (Cox, Wagman & Medvedev 1989)
  ...codata('H2', 'g', ['0', '0'], ['130.680', '0.003'], 'S° confirmed'),
  ...codata('O2', 'g', ['0', '0'], ['205.152', '0.005'], 'S° confirmed'),
  ...codata('N2', 'g', ['0', '0'], ['191.609', '0.004'], 'S° confirmed'),
  ...codata('Cl2', 'g', ['0', '0'], ['223.081', '0.010'], 'corroborated'),
  ...codata('C', 'cr, graphite', ['0', '0'], ['5.74', '0.10'], 'corroborated'),
  ...codata('S', 'cr, rhombic', ['0', '0'], undefined, 'zero by definition (S° left out: from memory, no second table here)'),
  // Version 1 of ΔfH°(C, g) went into 2026.1 without its uncertainty; 2026.2 revises it (REFERENCE_REVISIONS).
  ...codata('C', 'g', ['716.68'], ['158.100', '0.003'], 'values confirmed; uncertainties corroborated'),
  ...codata('O', 'g', ['249.18', '0.10'], undefined, 'ΔfH° confirmed (S° left out: from memory)'),
  ...codata('N', 'g', ['472.68', '0.40'], undefined, 'ΔfH° corroborated (S° left out: from memory)'),
  ...codata('H2O', 'l', ['-285.830', '0.040'], ['69.95', '0.03'], 'ΔfH° confirmed; S° corroborated'),
  ...codata('H2O', 'g', ['-241.826', '0.040'], ['188.835', '0.010'], 'corroborated'),
  ...codata('CO2', 'g', ['-393.51', '0.13'], ['213.785', '0.010'], 'ΔfH° confirmed; S° corroborated'),
  ...codata('CO', 'g', ['-110.53', '0.17'], ['197.660', '0.004'], 'values confirmed; uncertainties corroborated'),
  ...codata('NH3', 'g', ['-45.94', '0.35'], ['192.77', '0.05'], 'corroborated'),

  // NBS Tables (Wagman et al. 1982)
  ...nbs('CH4', 'g', '-74.81', '-50.72', '186.264', '35.309', 'corroborated', NBS_CP_FROM_MEMORY),
  ...nbs('C2H6', 'g', '-84.68', '-32.82', '229.60', undefined, 'corroborated (Cp° left out: from memory, no second table here)'),
  ...nbs('CH3OH', 'l', '-238.66', '-166.27', '126.8', undefined, 'corroborated (Cp° left out: from memory, no second table here)'),
  ...nbs('CH3OH', 'g', '-200.66', '-161.96', '239.81', undefined, 'corroborated (Cp° left out: from memory, no second table here)'),
  ...nbs('C2H5OH', 'l', '-277.69', '-174.78', '160.7', undefined, 'corroborated (Cp° left out: from memory, no second table here)'),
  ...nbs('C2H5OH', 'g', '-235.10', '-168.49', '282.70', undefined, 'corroborated (Cp° left out: from memory, no second table here)'),
  ...nbs('CO', 'g', '-110.525', '-137.168', '197.674', '29.142', 'corroborated', NBS_CP_FROM_MEMORY),
  ...nbs('CO2', 'g', '-393.509', '-394.359', '213.74', undefined, 'corroborated (Cp° left out: from memory, no second table here)'),
  ...nbs('H2O', 'l', '-285.830', '-237.129', '69.91', '75.291', 'corroborated', NBS_CP_FROM_MEMORY),
  ...nbs('H2', 'g', '0', '0', '130.684', '28.824', 'corroborated', NBS_CP_FROM_MEMORY),
  ...nbs('O2', 'g', '0', '0', '205.138', '29.355', 'corroborated', NBS_CP_FROM_MEMORY),
  ...nbs('N2', 'g', '0', '0', '191.61', '29.125', 'corroborated', NBS_CP_FROM_MEMORY),
  // The 2026.1 load entered ΔfH°(CO, g) from the NBS tables twice; 2026.2 retires the duplicate.
  {
    key: 'nbs-1982:CO(g):dfH:duplicate', species: 'CO', phase: 'g', quantity: 'dfH', value: '-110.525', unit: KJ, source: 'nbs-1982',
    release: '2026.1', reading: 'corroborated', notes: 'Entered a second time by the 2026.1 bulk load.',
  },

  // NIST-JANAF Thermochemical Tables, 4th ed. (Chase 1998), added in 2026.2
  ...janaf('N2', 'g', '29.124', '191.609'),
  ...janaf('O2', 'g', '29.376', '205.147'),
  ...janaf('H2', 'g', '28.836', '130.680'),
  ...janaf('H2O', 'g', '33.590', '188.834', '-241.826', '-228.582'),
  ...janaf('CO', 'g', '29.142', '197.653', '-110.527', '-137.163'),
  ...janaf('CH4', 'g', '35.639', '186.251', '-74.873', '-50.768'),
  ...janaf('H2O', 'l', '75.351', '69.950', '-285.830', '-237.141'),
  ...janaf('NH3', 'g', '35.652', '192.774', '-45.898', '-16.367'),
];

/** A later version of a reference value (same source, corrected entry). */
export interface ReferenceRevision {
  key: string;
  revises: string;
  release: ReferenceRelease;
  uncertainty?: string;
  value?: string;
  notes: string;
}

export const REFERENCE_REVISIONS: ReferenceRevision[] = [
  {
    key: 'codata-1989:C(g):dfH:v2',
    revises: 'codata-1989:C(g):dfH',
    release: '2026.2',
    uncertainty: '0.45',
    notes: 'Version 2 adds the uncertainty printed in CODATA 1989 (value confirmed; uncertainty corroborated), omitted by the 2026.1 entry.',
  },
];

export interface ReferenceRetirement {
  key: string;
  retires: string;
  release: ReferenceRelease;
  reason: string;
}

export const REFERENCE_RETIREMENTS: ReferenceRetirement[] = [
  {
    key: 'nbs-1982:CO(g):dfH:duplicate:retired',
    retires: 'nbs-1982:CO(g):dfH:duplicate',
    release: '2026.2',
    reason: 'Duplicate of the NBS 1982 ΔfH°(CO, g) entry (same source, same number), created twice by the 2026.1 bulk load.',
  },
];

export interface ReferenceFit {
  key: string;
  species: string;
  phase: string;
  source: string;
  release: ReferenceRelease;
  tMin: number;
  tMax: number;
  ranges: { tMin: number; tMax: number; coefficients: number[] }[];
  reading: string;
}

/** A TM-4513 set as a two-range fit row, 200–1000–6000 K. */
function tm4513Fit(species: keyof typeof NASA_TM_4513_SETS, release: ReferenceRelease, reading: string): ReferenceFit {
  const set = NASA_TM_4513_SETS[species];
  return {
    key: `nasa-tm-4513:${species}(g)`,
    species,
    phase: 'g',
    source: 'nasa-tm-4513',
    release,
    tMin: 200,
    tMax: 6000,
    reading,
    ranges: [
      { tMin: 200, tMax: 1000, coefficients: [...set.low] },
      { tMin: 1000, tMax: 6000, coefficients: [...set.high] },
    ],
  };
}

/**
 * NASA 7-coefficient polynomials (McBride, Gordon & Reno, NASA TM-4513, 1993); the coefficients
 * and where each copy comes from are in api/src/reference-data/nasa-tm-4513.ts. N2 and H2O are
 * checked against JANAF 1998 in reference-set.spec; the others by the engine's specs (JANAF rows
 * for O2, H2, CO, NH3) and, for CO2 and CH4, against the CODATA/NBS S° and Cp° at 298.15 K.
 */
export const REFERENCE_FITS: ReferenceFit[] = [
  tm4513Fit('N2', '2026.1', 'as reproduced in a public copy attributing them to TM-4513'),
  tm4513Fit('H2O', '2026.2', 'as reproduced in a public copy attributing them to TM-4513'),
  ...(['H2', 'O2', 'CO', 'CO2', 'CH4', 'NH3'] as const).map((species) =>
    tm4513Fit(species, '2026.2', "as reproduced in Cantera's data/nasa_gas.yaml, which cites TM-4513"),
  ),
];

/** Splits "cr, graphite" into phase code and polymorph. */
export function splitPhase(label: string): { phase: PhaseCode; polymorph: string | null } {
  const [phase, polymorph] = label.split(',').map((s) => s.trim());
  if (phase === 'aq' && polymorph === 'inf') return { phase: 'aq,inf', polymorph: null };
  return { phase: phase as PhaseCode, polymorph: polymorph ?? null };
}
