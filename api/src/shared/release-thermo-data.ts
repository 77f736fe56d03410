import type { EntityManager } from 'typeorm';
import {
  ATM_TO_BAR_GAS_ENTROPY_CORRECTION,
  compileHeatCapacity,
  P_ATM,
  ThermoInputError,
  T_REF,
  type HeatCapacityFunction,
  type SpeciesThermoData,
} from '../thermo';
import type { PhaseCode } from '../species/phase-code';
import { phaseLabel } from '../species/phase-code';
import type { FitForm, UncertaintyKind } from '../values/value-vocabulary';
import { citedSourceJoin } from '../sources/cited-source';
import { anchorFitEntropy } from './entropy-anchor';

/**
 * What a release holds for computing with one species in one phase: the recommended ΔfH°, S°,
 * Cp° and ΔfG° and the recommended heat-capacity fit, turned into the engine's inputs (SI units,
 * standard uncertainties, 1 bar).
 */

/** A recommended value as computations use it. */
export interface RecommendedValue {
  id: string;
  /** SI, at the stored pressure */
  valueSi: number;
  /** standard uncertainty u (GUM), SI; null when the source states none */
  standardUncertainty: number | null;
  temperatureK: number;
  pressurePa: number;
  sourceId: string;
  sourceKey: string;
}

export interface RecommendedFit {
  id: string;
  form: FitForm;
  tMin: number;
  tMax: number;
  ranges: Array<{ tMin: number; tMax: number; coefficients?: number[]; points?: [number, number][] }>;
  pressurePa: number;
  sourceId: string;
  sourceKey: string;
}

/** One species phase with its recommended data in a release. */
export interface PhaseThermoRecord {
  speciesPhaseId: string;
  speciesId: string;
  formula: string;
  hillFormula: string;
  name: string;
  charge: number;
  composition: Record<string, number>;
  phase: PhaseCode;
  polymorph: string | null;
  isReferenceState: boolean;
  dfH?: RecommendedValue;
  S?: RecommendedValue;
  Cp?: RecommendedValue;
  dfG?: RecommendedValue;
  fit?: RecommendedFit;
}

/** The engine's inputs for one species phase, with what is known about their uncertainty. */
export interface ComputableSpecies {
  record: PhaseThermoRecord;
  /** e.g. "H2O(g)", "C(cr, graphite)" */
  label: string;
  data: SpeciesThermoData;
  /** where the heat capacity comes from: a fit, the Cp° value (valid at 298.15 K only), or nothing */
  heatCapacitySource: 'fit' | 'value' | 'none';
  /** valid range of the heat-capacity function / K (298.15–298.15 without a fit) */
  tMin: number;
  tMax: number;
  /** ΔfH°(298.15 K) is known (a recommended value, or zero for an element in its reference state) */
  hasFormationEnthalpy: boolean;
  /** S°(T) is known: a recommended S°, or a NASA or Shomate fit that carries its own entropy */
  hasEntropy: boolean;
  /** false when an input of that kind has no stated uncertainty (the propagated figure would understate it) */
  uncertaintyKnown: { formationEnthalpy: boolean; entropy: boolean; heatCapacity: boolean };
  /** conversions and assumptions a reader must be told about */
  notes: string[];
}

interface RecordRow {
  speciesPhaseId: string;
  speciesId: string;
  formula: string;
  hillFormula: string;
  name: string;
  charge: number;
  composition: Record<string, number>;
  phase: PhaseCode;
  polymorph: string | null;
  isReferenceState: boolean;
  values: ValueRow[];
  fits: RecommendedFit[] | null;
}

interface ValueRow {
  quantity: 'dfH' | 'S' | 'Cp' | 'dfG';
  id: string;
  valueSi: number;
  uncertaintySi: number | null;
  uncertaintyKind: UncertaintyKind | null;
  coverageFactor: number | null;
  temperatureK: number;
  pressurePa: number;
  sourceId: string;
  sourceKey: string;
}

/** A fit row never changes (fits are append-only), so its engine function is built once. */
const fitFunctions = new Map<string, HeatCapacityFunction | null>();
const FIT_CACHE_LIMIT = 20_000;

/** Standard uncertainty u from a stored uncertainty: u itself, or U/k for an expanded one. */
export function standardUncertainty(uncertainty: number | null, kind: UncertaintyKind | null, coverageFactor: number | null): number | null {
  if (uncertainty === null || kind === null) return null;
  return kind === 'expanded' ? uncertainty / (coverageFactor ?? 2) : uncertainty;
}

/**
 * One statement for species phases and their recommended data in release $1: the phases matched
 * by `where` (on `sp`), each with its recommended values and fit as JSON. PostgreSQL prints a
 * double precision in JSON with the shortest text that reads back to the same number, so the
 * values arrive exactly as stored.
 */
function phaseThermoSql(where: string): string {
  return `SELECT sp.id AS "speciesPhaseId", s.id AS "speciesId", s.formula, s.hill_formula AS "hillFormula", s.name, s.charge,
            s.composition, sp.phase, sp.polymorph, sp.is_reference_state AS "isReferenceState",
            (SELECT coalesce(json_agg(json_build_object('quantity', v.quantity, 'id', v.id, 'valueSi', v.value_si,
                      'uncertaintySi', v.uncertainty_si, 'uncertaintyKind', v.uncertainty_kind, 'coverageFactor', v.coverage_factor,
                      'temperatureK', v.temperature_k, 'pressurePa', v.pressure_pa, 'sourceId', src.id, 'sourceKey', src.short_key)), '[]')
               FROM release_members m
               JOIN thermo_values v ON v.id = m.value_id
               ${citedSourceJoin('v.source_id')}
              WHERE m.release_id = $1 AND m.species_phase_id = sp.id AND m.is_recommended
                AND m.member_kind = 'value' AND m.quantity IN ('dfH', 'S', 'Cp', 'dfG')) AS values,
            (SELECT json_agg(json_build_object('id', f.id, 'form', f.form, 'tMin', f.t_min_k, 'tMax', f.t_max_k, 'ranges', f.ranges,
                      'pressurePa', f.pressure_pa, 'sourceId', src.id, 'sourceKey', src.short_key))
               FROM release_members m
               JOIN heat_capacity_fits f ON f.id = m.fit_id
               ${citedSourceJoin('f.source_id')}
              WHERE m.release_id = $1 AND m.species_phase_id = sp.id AND m.is_recommended AND m.member_kind = 'fit') AS fits
       FROM species_phases sp JOIN species s ON s.id = sp.species_id
      WHERE ${where}`;
}

const PHASES_BY_ID = phaseThermoSql('sp.id = ANY($2::uuid[])');
const PHASES_OF_SPECIES = phaseThermoSql(
  'sp.species_id = $2 AND EXISTS (SELECT 1 FROM release_members h WHERE h.release_id = $1 AND h.species_phase_id = sp.id)',
);

function toRecords(rows: RecordRow[]): Map<string, PhaseThermoRecord> {
  const records = new Map<string, PhaseThermoRecord>();
  for (const { values, fits, ...phase } of rows) {
    const record: PhaseThermoRecord = { ...phase };
    for (const v of values) {
      record[v.quantity] = {
        id: v.id,
        valueSi: v.valueSi,
        standardUncertainty: standardUncertainty(v.uncertaintySi, v.uncertaintyKind, v.coverageFactor),
        temperatureK: v.temperatureK,
        pressurePa: v.pressurePa,
        sourceId: v.sourceId,
        sourceKey: v.sourceKey,
      };
    }
    if (fits?.length) record.fit = fits[0];
    records.set(record.speciesPhaseId, record);
  }
  return records;
}

/** The species phases `speciesPhaseIds` with their recommended data in release `releaseId` (one statement). */
export async function loadPhaseThermo(manager: EntityManager, releaseId: string, speciesPhaseIds: string[]): Promise<Map<string, PhaseThermoRecord>> {
  if (speciesPhaseIds.length === 0) return new Map();
  return toRecords(await manager.query(PHASES_BY_ID, [releaseId, speciesPhaseIds]));
}

/** Every phase of a species that holds data in release `releaseId`, with its recommended data (one statement). */
export async function loadSpeciesThermo(manager: EntityManager, releaseId: string, speciesId: string): Promise<Map<string, PhaseThermoRecord>> {
  return toRecords(await manager.query(PHASES_OF_SPECIES, [releaseId, speciesId]));
}

/** "H2O(g)", "C(cr, graphite)": the formula as entered and the IUPAC phase label. */
export function speciesLabel(record: Pick<PhaseThermoRecord, 'formula' | 'phase' | 'polymorph'>): string {
  return `${record.formula}(${phaseLabel(record.phase, record.polymorph)})`;
}

const isAtReferenceTemperature = (v: RecommendedValue | undefined): v is RecommendedValue => v !== undefined && Math.abs(v.temperatureK - T_REF) < 1e-6;

/** ln(p_atm / p°): added to S/R of an ideal gas given at 1 atm to state it at 1 bar. */
const LN_ATM_OVER_BAR = Math.log(P_ATM / 1e5);

/**
 * The engine's form of a stored fit (coefficients as published, see values/fit-ranges.ts); an
 * ideal-gas fit given at 1 atm has its entropy constant moved to 1 bar. Null when the stored
 * form cannot be evaluated (a multi-range constant fit).
 */
export function fitFunction(fit: RecommendedFit, gas: boolean): HeatCapacityFunction | null {
  const key = `${fit.id}|${gas}`;
  if (fitFunctions.has(key)) return fitFunctions.get(key)!;
  const atm = gas && fit.pressurePa === P_ATM;
  let fn: HeatCapacityFunction | null;
  switch (fit.form) {
    case 'nasa7':
      fn = { kind: 'nasa7', ranges: fit.ranges.map((r) => {
        const c = [...r.coefficients!];
        if (atm) c[6] += LN_ATM_OVER_BAR;
        return { tMin: r.tMin, tMax: r.tMax, coefficients: c };
      }) };
      break;
    case 'nasa9':
      fn = { kind: 'nasa9', ranges: fit.ranges.map((r) => {
        const c = r.coefficients!;
        return { tMin: r.tMin, tMax: r.tMax, coefficients: c.slice(0, 7), b1: c[7], b2: c[8] + (atm ? LN_ATM_OVER_BAR : 0) };
      }) };
      break;
    case 'shomate':
      fn = { kind: 'shomate', ranges: fit.ranges.map((r) => {
        const [A, B, C, D, E, F, G, H] = r.coefficients!;
        return { tMin: r.tMin, tMax: r.tMax, A, B, C, D, E, F, G: G + (atm ? ATM_TO_BAR_GAS_ENTROPY_CORRECTION : 0), H };
      }) };
      break;
    case 'constant':
      fn = fit.ranges.length === 1 ? { kind: 'constant', cp: fit.ranges[0].coefficients![0], tMin: fit.tMin, tMax: fit.tMax } : null;
      break;
    case 'tabulated': {
      const points: { temperature: number; cp: number }[] = [];
      for (const r of fit.ranges) {
        for (const [temperature, cp] of r.points ?? []) {
          if (points.length === 0 || temperature > points[points.length - 1].temperature) points.push({ temperature, cp });
        }
      }
      fn = { kind: 'tabulated', points };
      break;
    }
    default:
      fn = null;
  }
  if (fitFunctions.size >= FIT_CACHE_LIMIT) fitFunctions.clear();
  fitFunctions.set(key, fn);
  return fn;
}

/** The function when the engine accepts it (a tabulated fit must span 298.15 K, for example), else null. */
function usable(fn: HeatCapacityFunction | null): HeatCapacityFunction | null {
  if (!fn) return null;
  try {
    compileHeatCapacity(fn, 1);
    return fn;
  } catch (error) {
    if (error instanceof ThermoInputError) return null;
    throw error;
  }
}

/** A constant-Cp function that is valid at 298.15 K only (a Cp° value says nothing about other T). */
function atReferenceTemperatureOnly(cp: number): HeatCapacityFunction {
  return { kind: 'constant', cp, tMin: T_REF, tMax: T_REF + 1e-6 };
}

/**
 * Turns a record into the engine's inputs. ΔfH° of an element in its reference state is zero by
 * definition even when the release stores no value. S° of an ideal gas given at 1 atm is moved to
 * 1 bar (+R·ln 1.01325); condensed phases are taken as they are (the pressure effect is below the
 * tables' precision). Without a fit, the Cp° value stands for Cp at 298.15 K only.
 */
export function computable(record: PhaseThermoRecord): ComputableSpecies {
  const label = speciesLabel(record);
  const notes: string[] = [];
  const gas = record.phase === 'g';

  const dfH = isAtReferenceTemperature(record.dfH) ? record.dfH : undefined;
  const elementReference = record.isReferenceState && Object.keys(record.composition).length === 1 && record.charge === 0;
  const formationEnthalpy = dfH
    ? { value: dfH.valueSi, uncertainty: dfH.standardUncertainty ?? 0 }
    : { value: 0, uncertainty: 0 };
  const hasFormationEnthalpy = dfH !== undefined || elementReference;

  const s = isAtReferenceTemperature(record.S) ? record.S : undefined;
  let entropyValue = s?.valueSi ?? Number.NaN;
  if (s && s.pressurePa === P_ATM) {
    if (gas) {
      entropyValue += ATM_TO_BAR_GAS_ENTROPY_CORRECTION;
      notes.push(`S° of ${label} (${s.sourceKey}) is given at 1 atm; converted to 1 bar (+${ATM_TO_BAR_GAS_ENTROPY_CORRECTION.toFixed(4)} J/(mol·K), ideal gas).`);
    } else {
      notes.push(`S° of ${label} (${s.sourceKey}) is given at 1 atm; taken as the 1 bar value (the difference is negligible for a condensed phase).`);
    }
  }
  if (dfH && dfH.pressurePa === P_ATM) notes.push(`ΔfH° of ${label} (${dfH.sourceKey}) is given at 1 atm; taken as the 1 bar value (unchanged for an ideal gas).`);

  let heatCapacity: HeatCapacityFunction | null = null;
  let heatCapacitySource: ComputableSpecies['heatCapacitySource'] = 'none';
  let tMin = T_REF;
  let tMax = T_REF;
  if (record.fit) {
    heatCapacity = usable(fitFunction(record.fit, gas));
    if (heatCapacity) {
      heatCapacitySource = 'fit';
      tMin = record.fit.tMin;
      tMax = record.fit.tMax;
      if (gas && record.fit.pressurePa === P_ATM) notes.push(`The heat-capacity fit of ${label} (${record.fit.sourceKey}) is given at 1 atm; its entropy is converted to 1 bar.`);
    } else {
      notes.push(`The ${record.fit.form} fit of ${label} (${record.fit.sourceKey}) has a layout the engine cannot evaluate; it is not used.`);
    }
  }
  const cpValue = isAtReferenceTemperature(record.Cp) ? record.Cp : undefined;
  if (!heatCapacity) {
    heatCapacity = atReferenceTemperatureOnly(cpValue?.valueSi ?? 0);
    heatCapacitySource = cpValue ? 'value' : 'none';
  }
  const fitCarriesEntropy = heatCapacitySource === 'fit' && (record.fit!.form === 'nasa7' || record.fit!.form === 'nasa9' || record.fit!.form === 'shomate');
  if (fitCarriesEntropy && s && heatCapacity) {
    const anchored = anchorFitEntropy(heatCapacity, entropyValue);
    heatCapacity = anchored.fn;
    if (Math.abs(anchored.shift) >= 0.0005) {
      notes.push(
        `The ${record.fit!.form} fit of ${label} (${record.fit!.sourceKey}) gives S°(298.15 K) ${anchored.shift > 0 ? 'lower' : 'higher'} by ${Math.abs(anchored.shift).toFixed(3)} J/(mol·K) than the recommended S° (${s.sourceKey}); its entropy is anchored to the recommended value.`,
      );
    }
  }
  const hasEntropy = s !== undefined || fitCarriesEntropy;
  return {
    record,
    label,
    data: {
      label,
      elements: record.composition,
      charge: record.charge,
      formationEnthalpy,
      // Constant and tabulated forms need an anchor; without S° they still give Cp and H − H298.
      entropy: { value: Number.isFinite(entropyValue) ? entropyValue : 0, uncertainty: s?.standardUncertainty ?? 0 },
      heatCapacity,
      heatCapacityUncertainty: cpValue?.standardUncertainty ?? 0,
    },
    heatCapacitySource,
    tMin,
    tMax,
    hasFormationEnthalpy,
    hasEntropy,
    uncertaintyKnown: {
      // An element's reference state has ΔfH° = 0 exactly, whether or not the source prints "± 0".
      formationEnthalpy: dfH ? dfH.standardUncertainty !== null || (elementReference && dfH.valueSi === 0) : elementReference,
      entropy: s !== undefined && s.standardUncertainty !== null,
      heatCapacity: cpValue !== undefined && cpValue.standardUncertainty !== null,
    },
    notes,
  };
}

/** Element symbol (or 'e-') → the reference-state species phase a release holds for it. */
export type ReferenceRecords = ReadonlyMap<string, ComputableSpecies>;

const referenceCache = new Map<string, { until: number; value: Promise<ReferenceRecords> }>();
const REFERENCE_TTL_MS = 60_000;

/**
 * The reference states of the elements in a release: species phases flagged as an element's
 * reference state (H2(g), O2(g), C(cr, graphite)…) that hold data in the release, and the electron
 * when the catalogue has it. Cached for a minute per published release.
 */
export function elementReferences(manager: EntityManager, release: { id: string; status: string }): Promise<ReferenceRecords> {
  const cached = referenceCache.get(release.id);
  if (cached && cached.until > Date.now()) return cached.value;
  const value = (async () => {
    const rows: { id: string }[] = await manager.query(
      `SELECT sp.id FROM species_phases sp JOIN species s ON s.id = sp.species_id
        WHERE ((sp.is_reference_state AND s.charge = 0) OR s.hill_formula = 'e-')
          AND EXISTS (SELECT 1 FROM release_members m WHERE m.release_id = $1 AND m.species_phase_id = sp.id)`,
      [release.id],
    );
    const records = await loadPhaseThermo(manager, release.id, rows.map((r) => r.id));
    const references = new Map<string, ComputableSpecies>();
    for (const record of records.values()) {
      const symbols = Object.keys(record.composition);
      const key = record.hillFormula === 'e-' ? 'e-' : symbols.length === 1 ? symbols[0] : undefined;
      if (key && !references.has(key)) references.set(key, computable(record));
    }
    return references;
  })();
  if (release.status === 'published') {
    referenceCache.set(release.id, { until: Date.now() + REFERENCE_TTL_MS, value });
    value.catch(() => referenceCache.delete(release.id));
  }
  return value;
}
