/** A citable source of values: `GET /api/v1/species/{id}` nests it in every value and fit. */
export interface SourceRef {
  readonly id: string | number;
  /** Short key, e.g. `CODATA-1989`. */
  readonly key: string;
  readonly citation: string;
  readonly doi: string | null;
}

/** An earlier version of a value; each lists the releases that published it. */
export interface ValueVersion {
  readonly id: string | number;
  readonly value: number;
  readonly uncertainty: number | null;
  readonly createdAt: string;
  readonly releases: readonly string[];
}

export type QuantityCode = 'dfH' | 'S' | 'Cp' | 'dfG' | 'dtrsH';
export type ValueMethod = 'measured' | 'evaluated' | 'computed' | 'estimated';

/** One value of a quantity, in SI (`unit` says which: J/mol or J/(mol·K)). */
export interface ThermoValue {
  readonly id: string | number;
  readonly lineageId: string | number;
  readonly value: number;
  readonly uncertainty: number | null;
  readonly uncertaintyKind: 'standard' | 'expanded';
  readonly coverageFactor: number | null;
  readonly unit: string;
  /** K. */
  readonly temperature: number | null;
  /** Pa (the standard pressure is 1 bar = 100 000 Pa). */
  readonly pressure: number | null;
  readonly method: ValueMethod;
  readonly methodDetail: string | null;
  readonly source: SourceRef;
  readonly enteredBy: string | null;
  readonly approvedBy: string | null;
  readonly createdAt: string;
  readonly history: readonly ValueVersion[];
}

export interface PhaseQuantity {
  readonly quantity: QuantityCode;
  /** Display symbol, e.g. `ΔfH°`. */
  readonly symbol: string;
  readonly unit: string;
  readonly recommended: ThermoValue | null;
  readonly alternatives: readonly ThermoValue[];
}

export type FitForm = 'constant' | 'shomate' | 'nasa7' | 'nasa9' | 'tabulated';

/** A heat-capacity fit and the temperature range (K) it is valid over. */
export interface HeatCapacityFit {
  readonly id: string | number;
  readonly form: FitForm;
  readonly tMin: number;
  readonly tMax: number;
  readonly source: SourceRef;
  readonly recommended: boolean;
}

export interface SpeciesPhase {
  readonly phase: string;
  readonly polymorph: string | null;
  readonly quantities: readonly PhaseQuantity[];
  readonly fits: readonly HeatCapacityFit[];
}

export interface SpeciesDetail {
  readonly id: string | number;
  readonly formula: string;
  readonly hillFormula: string;
  readonly name: string;
  readonly charge: number;
  /** g/mol. */
  readonly molarMass: number;
  readonly synonyms: readonly string[];
  readonly identifiers: {
    readonly inchi: string | null;
    readonly inchiKey: string | null;
    readonly casRn: string | null;
    readonly smiles: string | null;
  };
  readonly release: string;
  readonly phases: readonly SpeciesPhase[];
}

/** A property at one temperature, in the unit the API states (per `units=kJ|kcal`). */
export interface PropertyValue {
  readonly value: number;
  readonly uncertainty: number | null;
  readonly unit: string;
}

export type PropertyKey = 'Cp' | 'S' | 'HminusH298' | 'gibbsEnergyFunction' | 'deltaFH' | 'deltaFG' | 'log10Kf';

export type PropertyRow = {
  /** K. */
  readonly T: number;
  /** True outside the fit's range, when extrapolation was asked for. */
  readonly extrapolated: boolean;
} & { readonly [key in PropertyKey]?: PropertyValue | null };

export interface PropertyTable {
  readonly species: { readonly id: string | number; readonly formula: string; readonly name: string };
  readonly phase: string;
  readonly polymorph: string | null;
  readonly release: string;
  readonly units: 'kJ' | 'kcal';
  readonly fit: { readonly form: FitForm; readonly tMin: number; readonly tMax: number };
  readonly rows: readonly PropertyRow[];
}

/** A phase as the page and its URL name it. */
export interface PhaseKey {
  readonly phase: string;
  readonly polymorph: string | null;
}

export function samePhase(a: PhaseKey, b: PhaseKey): boolean {
  return a.phase === b.phase && (a.polymorph ?? null) === (b.polymorph ?? null);
}

/** The temperature range (K) the phase's fits cover, or null without a fit that spans one. */
export function fitRange(phase: SpeciesPhase): { readonly tMin: number; readonly tMax: number } | null {
  const recommended = phase.fits.filter((fit) => fit.recommended);
  const fits = recommended.length > 0 ? recommended : phase.fits;
  if (fits.length === 0) {
    return null;
  }
  const tMin = Math.min(...fits.map((fit) => fit.tMin));
  const tMax = Math.max(...fits.map((fit) => fit.tMax));
  return tMax > tMin ? { tMin, tMax } : null;
}
