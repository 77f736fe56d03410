import type { Method, Quantity } from '../src/values/value-vocabulary';
import type { PhaseCode } from '../src/species/phase-code';
import { scaledDecimal } from '../../seeds-demo/seed-support';
import type { SpeciesCategory } from './synthetic-species';

/**
 * The invented sources of the benchmark data set. Each has a character — evaluated tables with
 * expanded uncertainties, calorimetry, quantum chemistry with its level of theory, group
 * additivity, an old table in kcal at 1 atm — so that alternatives disagree the way real ones
 * do. Titles say "benchmark"; DOIs use Crossref's test prefix 10.5555.
 */
export interface SyntheticSource {
  key: string;
  title: string;
  year: number;
  doi: string | null;
  authors: [family: string, given: string][];
  type: 'book' | 'article-journal' | 'report';
  container?: string;
  method: Method;
  levelOfTheory?: string;
  /** Pa */
  pressure: 100000 | 101325;
  uncertaintyKind: 'standard' | 'expanded';
  /** share of rows printed without an uncertainty */
  withoutUncertainty: number;
  units: 'SI' | 'cal';
  /** lower = preferred when the recommended value is chosen */
  priority: number;
  /** range of the standard uncertainty per quantity (SI: J/mol or J/(mol·K)) */
  uncertainty: Partial<Record<Quantity, [number, number]>>;
  /** decimals printed (in the source's unit) */
  decimals: number;
}

const kJ = 1000;

export const SOURCES: SyntheticSource[] = [
  {
    key: 'bx-ref-2019', title: 'Evaluated Reference Tables of Chemical Thermodynamics (benchmark edition)', year: 2019,
    doi: '10.5555/kelvindex-bench.ref-2019', authors: [['Halvorsen', 'M. K.'], ['Osei', 'A.'], ['Lindqvist', 'T.']], type: 'book',
    method: 'evaluated', pressure: 100000, uncertaintyKind: 'expanded', withoutUncertainty: 0, units: 'SI', priority: 1, decimals: 2,
    uncertainty: { dfH: [0.1 * kJ, 3 * kJ], S: [0.05, 1.5], Cp: [0.05, 1], dfG: [0.15 * kJ, 3.5 * kJ] },
  },
  {
    key: 'bx-nasa-2002', title: 'Seven-Coefficient Polynomials for Combustion and Atmospheric Species (benchmark set)', year: 2002,
    doi: null, authors: [['Brandt', 'E. R.'], ['Coulibaly', 'S.']], type: 'report',
    method: 'evaluated', pressure: 100000, uncertaintyKind: 'standard', withoutUncertainty: 0.1, units: 'SI', priority: 2, decimals: 3,
    uncertainty: { dfH: [0.1 * kJ, 2 * kJ], S: [0.02, 0.5], Cp: [0.02, 0.5] },
  },
  {
    key: 'bx-aq-2005', title: 'Standard Properties of Aqueous Ions and Electrolytes (benchmark compilation)', year: 2005,
    doi: '10.5555/kelvindex-bench.aq-2005', authors: [['Moreau', 'C.'], ['Tanaka', 'H.']], type: 'article-journal',
    container: 'Journal of Invented Solution Chemistry',
    method: 'evaluated', pressure: 100000, uncertaintyKind: 'expanded', withoutUncertainty: 0.05, units: 'SI', priority: 2, decimals: 2,
    uncertainty: { dfH: [0.2 * kJ, 4 * kJ], S: [0.5, 5], Cp: [1, 10], dfG: [0.3 * kJ, 4 * kJ] },
  },
  {
    key: 'bx-org-2017', title: 'Thermochemistry of Organic Compounds: An Evaluated Compilation (benchmark edition)', year: 2017,
    doi: '10.5555/kelvindex-bench.org-2017', authors: [['Petrova', 'I. V.'], ['Ward', 'J. L.'], ['Nakamura', 'K.']], type: 'book',
    method: 'evaluated', pressure: 100000, uncertaintyKind: 'standard', withoutUncertainty: 0.05, units: 'SI', priority: 2, decimals: 2,
    uncertainty: { dfH: [0.3 * kJ, 4 * kJ], S: [0.2, 3], Cp: [0.1, 2], dfG: [0.5 * kJ, 5 * kJ], dtrsH: [0.1 * kJ, 1.5 * kJ] },
  },
  {
    key: 'bx-calor-2015', title: 'Combustion Calorimetry of C1–C30 Compounds (benchmark series)', year: 2015,
    doi: '10.5555/kelvindex-bench.calor-2015', authors: [['Ferreira', 'R. S.'], ['Adeyemi', 'O.']], type: 'article-journal',
    container: 'Journal of Invented Calorimetry',
    method: 'measured', pressure: 100000, uncertaintyKind: 'standard', withoutUncertainty: 0, units: 'SI', priority: 3, decimals: 2,
    uncertainty: { dfH: [0.2 * kJ, 2 * kJ] },
  },
  {
    key: 'bx-dsc-2022', title: 'Adiabatic and DSC Heat Capacities of Solids and Liquids (benchmark series)', year: 2022,
    doi: '10.5555/kelvindex-bench.dsc-2022', authors: [['Kowalczyk', 'A.'], ['Reyes', 'D.']], type: 'article-journal',
    container: 'Journal of Invented Calorimetry',
    method: 'measured', pressure: 100000, uncertaintyKind: 'expanded', withoutUncertainty: 0, units: 'SI', priority: 3, decimals: 2,
    uncertainty: { S: [0.1, 2], Cp: [0.05, 1] },
  },
  {
    key: 'bx-vap-2012', title: 'Enthalpies of Vaporization of Organic Compounds (benchmark compilation)', year: 2012,
    doi: null, authors: [['Sandoval', 'P.'], ['Grünewald', 'H.']], type: 'report',
    method: 'measured', pressure: 100000, uncertaintyKind: 'standard', withoutUncertainty: 0, units: 'SI', priority: 3, decimals: 2,
    uncertainty: { dtrsH: [0.1 * kJ, 1.5 * kJ] },
  },
  {
    key: 'bx-salt-1968', title: 'Tables of Thermal Properties of Inorganic Substances (benchmark reprint of a 1968 table)', year: 1968,
    doi: null, authors: [['Whitcombe', 'G. A.']], type: 'book',
    method: 'evaluated', pressure: 101325, uncertaintyKind: 'standard', withoutUncertainty: 0.4, units: 'cal', priority: 4, decimals: 2,
    uncertainty: { dfH: [0.5 * kJ, 8 * kJ], S: [0.4, 4], Cp: [0.4, 4], dfG: [0.8 * kJ, 8 * kJ] },
  },
  {
    key: 'bx-g4-2021', title: 'G4 Thermochemistry of Gas-Phase Molecules and Ions (benchmark set)', year: 2021,
    doi: '10.5555/kelvindex-bench.g4-2021', authors: [['Iyer', 'S.'], ['Müller', 'F.'], ['Olsen', 'B.']], type: 'article-journal',
    container: 'Journal of Invented Computational Chemistry',
    method: 'computed', levelOfTheory: 'G4', pressure: 100000, uncertaintyKind: 'standard', withoutUncertainty: 0, units: 'SI', priority: 4, decimals: 1,
    uncertainty: { dfH: [2 * kJ, 6 * kJ], S: [1, 4], Cp: [0.5, 3], dfG: [2.5 * kJ, 7 * kJ] },
  },
  {
    key: 'bx-cbs-2020', title: 'CBS-QB3 Enthalpies of Formation of Gas-Phase Species (benchmark set)', year: 2020,
    doi: '10.5555/kelvindex-bench.cbs-2020', authors: [['Novak', 'J.'], ['Achterberg', 'L.']], type: 'article-journal',
    container: 'Journal of Invented Computational Chemistry',
    method: 'computed', levelOfTheory: 'CBS-QB3', pressure: 100000, uncertaintyKind: 'standard', withoutUncertainty: 0, units: 'SI', priority: 5, decimals: 1,
    uncertainty: { dfH: [3 * kJ, 8 * kJ], S: [1.5, 5], Cp: [1, 4] },
  },
  {
    key: 'bx-gav-2018', title: 'Group-Additivity Estimates for Organic Compounds (benchmark tables)', year: 2018,
    doi: null, authors: [['Lindgren', 'E.']], type: 'report',
    method: 'estimated', pressure: 100000, uncertaintyKind: 'standard', withoutUncertainty: 0, units: 'SI', priority: 6, decimals: 1,
    uncertainty: { dfH: [4 * kJ, 15 * kJ], S: [3, 10], Cp: [2, 8], dfG: [5 * kJ, 18 * kJ] },
  },
];

export const SOURCE_BY_KEY = new Map(SOURCES.map((s) => [s.key, s]));

type Candidates = readonly (readonly [string, number])[];

/**
 * Which sources may report a quantity for a species phase, with relative weights: the first
 * draw is the lineage every release holds (never retired), later draws are alternatives.
 */
export function candidateSources(category: SpeciesCategory, phase: PhaseCode, quantity: Quantity): Candidates {
  const gas = phase === 'g';
  const aqueous = phase === 'aq' || phase === 'aq,inf';
  switch (category) {
    case 'element':
    case 'atom':
    case 'electron':
    case 'core':
      return gas ? [['bx-ref-2019', 60], ['bx-nasa-2002', 40]] : [['bx-ref-2019', 70], ['bx-salt-1968', 30]];
    case 'ion':
      return aqueous ? [['bx-aq-2005', 60], ['bx-ref-2019', 40]] : [['bx-ref-2019', 50], ['bx-g4-2021', 50]];
    case 'organic-ion':
      if (aqueous) return quantity === 'Cp' ? [['bx-aq-2005', 100]] : [['bx-aq-2005', 70], ['bx-org-2017', 30]];
      return quantity === 'dfG' ? [['bx-g4-2021', 100]] : [['bx-g4-2021', 60], ['bx-cbs-2020', 40]];
    case 'molecular':
      if (gas) return quantity === 'dfG' ? [['bx-ref-2019', 60], ['bx-salt-1968', 40]] : [['bx-ref-2019', 40], ['bx-g4-2021', 30], ['bx-salt-1968', 30]];
      return quantity === 'S' || quantity === 'Cp'
        ? [['bx-ref-2019', 40], ['bx-salt-1968', 30], ['bx-dsc-2022', 30]]
        : [['bx-ref-2019', 50], ['bx-salt-1968', 50]];
    case 'salt':
      if (aqueous) return [['bx-aq-2005', 70], ['bx-ref-2019', 30]];
      return quantity === 'S' || quantity === 'Cp'
        ? [['bx-ref-2019', 40], ['bx-salt-1968', 30], ['bx-dsc-2022', 30]]
        : [['bx-ref-2019', 50], ['bx-salt-1968', 50]];
    case 'organic':
      if (quantity === 'dtrsH') return [['bx-vap-2012', 80], ['bx-org-2017', 20]];
      if (gas) {
        if (quantity === 'dfH') return [['bx-org-2017', 40], ['bx-g4-2021', 25], ['bx-cbs-2020', 15], ['bx-gav-2018', 20]];
        if (quantity === 'dfG') return [['bx-org-2017', 60], ['bx-g4-2021', 40]];
        return [['bx-org-2017', 40], ['bx-g4-2021', 35], ['bx-gav-2018', 25]];
      }
      if (quantity === 'dfH') return [['bx-org-2017', 45], ['bx-calor-2015', 35], ['bx-gav-2018', 20]];
      if (quantity === 'dfG') return [['bx-org-2017', 70], ['bx-gav-2018', 30]];
      return [['bx-org-2017', 35], ['bx-dsc-2022', 45], ['bx-gav-2018', 20]];
  }
}

/** The source of a gas's recommended NASA-7 fit, and of an occasional alternative fit. */
export function fitSources(category: SpeciesCategory, atoms: number): { primary: string; alternative: string } {
  const small = category !== 'organic' && category !== 'organic-ion' || atoms <= 8;
  return { primary: small ? 'bx-nasa-2002' : 'bx-g4-2021', alternative: 'bx-cbs-2020' };
}

/** One source's reading of a value: the stored SI numbers and the text as printed. */
export interface Reading {
  valueSi: number;
  uncertaintySi: number | null;
  uncertaintyKind: 'standard' | 'expanded' | null;
  coverageFactor: number | null;
  enteredValue: string;
  enteredUnit: string;
}

const CAL = 4.184;

/**
 * How `source` prints a value: rounded to its decimals in its unit (kJ/mol or J/(mol·K); kcal/mol
 * or cal/(mol·K) for the old table), with ± its uncertainty (expanded ones with k = 2).
 *
 * @param valueSi J/mol or J/(mol·K)
 * @param standardUncertainty u in SI, or null when the source prints none
 */
export function reading(source: SyntheticSource, quantity: Quantity, valueSi: number, standardUncertainty: number | null): Reading {
  const energy = quantity === 'dfH' || quantity === 'dfG' || quantity === 'dtrsH';
  const cal = source.units === 'cal';
  const factor = energy ? (cal ? CAL * 1000 : 1000) : cal ? CAL : 1;
  const unit = energy ? (cal ? 'kcal/mol' : 'kJ/mol') : cal ? 'cal/(mol·K)' : 'J/(mol·K)';
  const decimals = source.decimals + (!energy && source.decimals < 2 ? 1 : 0);
  const printed = (valueSi / factor).toFixed(decimals);
  const expanded = source.uncertaintyKind === 'expanded';
  let uncertaintyText: string | null = null;
  if (standardUncertainty !== null) {
    const stated = expanded ? 2 * standardUncertainty : standardUncertainty;
    uncertaintyText = Math.max(stated / factor, 10 ** -decimals).toFixed(decimals);
  }
  const toSi = (text: string) => (cal ? Math.round(Number(text) * factor * 1e6) / 1e6 : scaledDecimal(text, energy ? 3 : 0));
  const uncertaintySi = uncertaintyText === null ? null : toSi(uncertaintyText);
  return {
    valueSi: toSi(printed),
    uncertaintySi,
    uncertaintyKind: uncertaintySi === null ? null : expanded ? 'expanded' : 'standard',
    coverageFactor: uncertaintySi !== null && expanded ? 2 : null,
    enteredValue: uncertaintyText === null ? printed : `${printed} ± ${uncertaintyText}`,
    enteredUnit: unit,
  };
}
