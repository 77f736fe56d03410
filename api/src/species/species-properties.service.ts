import type { DataSource } from 'typeorm';
import {
  evaluateHeatCapacity,
  JOULES_PER,
  speciesAtTemperature,
  T_REF,
  type ElementReference,
  type SpeciesAtTemperature,
} from '../thermo';
import type { ResolvedRelease } from '../releases/release-resolution';
import { BadRequestError, NotFoundError, UnprocessableError } from '../shared/errors';
import {
  computable,
  elementReferences,
  loadSpeciesThermo,
  speciesLabel,
  type ComputableSpecies,
  type PhaseThermoRecord,
  type ReferenceRecords,
} from '../shared/release-thermo-data';
import { phaseLabel, type PhaseCode } from './phase-code';
import { SOURCE_COLUMNS, sourceRef, type SourceRef } from './species.service';

export type EnergyUnits = 'kJ' | 'kcal';

export interface Measured {
  value: number;
  /** standard uncertainty u; null when an input has no stated uncertainty */
  uncertainty: number | null;
  unit: string;
}

export interface PropertyRow {
  T: number;
  extrapolated: boolean;
  Cp: Measured | null;
  S: Measured | null;
  HminusH298: Measured | null;
  gibbsEnergyFunction: Measured | null;
  deltaFH: Measured | null;
  deltaFG: Measured | null;
  log10Kf: Measured | null;
}

export interface PropertyTable {
  species: { id: string; formula: string; name: string };
  phase: PhaseCode;
  polymorph: string | null;
  release: string;
  units: EnergyUnits;
  fit: { id: string; form: string; tMin: number; tMax: number; source: string } | null;
  rows: PropertyRow[];
  sources: SourceRef[];
  notes: string[];
}

export interface PropertyRequest {
  speciesId: string;
  phase?: { phase: PhaseCode; polymorph: string | null };
  polymorph?: string;
  temperatures: number[];
  units: EnergyUnits;
  extrapolate: boolean;
}

/** Equal to 298.15 K within floating-point noise. */
const atReference = (t: number) => Math.abs(t - T_REF) < 1e-9;
const inRange = (t: number, s: ComputableSpecies) => t >= s.tMin - 1e-9 && t <= s.tMax + 1e-9;

/**
 * Property tables of one species phase as a release holds it: Cp°, S°, H° − H°(298.15),
 * −(G° − H°(298.15))/T from the recommended fit and S°, and ΔfH°, ΔfG°, log10 Kf from the
 * recommended ΔfH° and the elements' reference states in the same release.
 */
export class SpeciesPropertiesService {
  constructor(private readonly dataSource: DataSource) {}

  async table(release: ResolvedRelease, request: PropertyRequest): Promise<PropertyTable> {
    const record = await this.choosePhase(release, request);
    const phaseId = record.speciesPhaseId;
    const references = await elementReferences(this.dataSource.manager, release);
    const sameAsReference = [...references.values()].find((r) => r.record.speciesPhaseId === phaseId);
    const species = sameAsReference ?? computable(record);
    const notes = new Set(species.notes);
    this.checkRange(species, request, release);

    const energy = JOULES_PER[request.units];
    const entropy = request.units === 'kJ' ? 1 : JOULES_PER.cal;
    const energyUnit = `${request.units}/mol`;
    const entropyUnit = request.units === 'kJ' ? 'J/(mol·K)' : 'cal/(mol·K)';
    const u = species.uncertaintyKnown;
    const formation = this.formationInputs(species, references, notes, release);
    this.noteUnknownUncertainties(species, notes);

    const rows = request.temperatures.map((t): PropertyRow => {
      const point = evaluateHeatCapacity(species.data.heatCapacity, t, { s298: species.data.entropy.value, extrapolate: true, subject: species.label });
      const reference = atReference(t);
      const uCp = u.heatCapacity ? species.data.heatCapacityUncertainty ?? 0 : null;
      const uH = reference ? 0 : uCp === null ? null : uCp * Math.abs(t - T_REF);
      const uS = u.entropy && (reference || uCp !== null) ? Math.hypot(species.data.entropy.uncertainty, (uCp ?? 0) * Math.log(t / T_REF)) : null;
      const hasCp = species.heatCapacitySource !== 'none';
      const row: PropertyRow = {
        T: t,
        extrapolated: point.extrapolated,
        Cp: hasCp ? { value: point.cp / entropy, uncertainty: scale(uCp, entropy), unit: entropyUnit } : null,
        S: species.hasEntropy ? { value: point.entropy / entropy, uncertainty: scale(uS, entropy), unit: entropyUnit } : null,
        HminusH298: hasCp || reference ? { value: point.enthalpyIncrement / energy, uncertainty: scale(uH, energy), unit: energyUnit } : null,
        gibbsEnergyFunction: species.hasEntropy && (hasCp || reference)
          ? { value: point.gibbsEnergyFunction / entropy, uncertainty: uS === null || uH === null ? null : Math.hypot(uS, uH / t) / entropy, unit: entropyUnit }
          : null,
        deltaFH: null,
        deltaFG: null,
        log10Kf: null,
      };
      const formed = formation && this.formationAt(species, formation, t, request.extrapolate, notes);
      if (formed) {
        const known = formation.uncertaintyKnown(reference);
        row.deltaFH = { value: formed.formationEnthalpy.value / energy, uncertainty: known.enthalpy ? formed.formationEnthalpy.uncertainty / energy : null, unit: energyUnit };
        row.deltaFG = { value: formed.formationGibbsEnergy.value / energy, uncertainty: known.gibbs ? formed.formationGibbsEnergy.uncertainty / energy : null, unit: energyUnit };
        row.log10Kf = { value: formed.log10Kf.value, uncertainty: known.gibbs ? formed.log10Kf.uncertainty : null, unit: '1' };
        row.extrapolated ||= formed.extrapolated;
      }
      return row;
    });
    if (rows.some((r) => r.extrapolated)) notes.add('Rows flagged extrapolated lie outside the valid range of a heat-capacity function; treat them with caution.');
    if (species.heatCapacitySource === 'value' && rows.some((r) => !atReference(r.T))) {
      notes.add(`Without a heat-capacity fit, Cp° of ${species.label} is held at its 298.15 K value.`);
    }

    const sourceIds = new Set<string>();
    for (const s of [species, ...(formation?.participants.map((p) => p.species) ?? [])]) {
      for (const v of [s.record.dfH, s.record.S, s.record.Cp, s.record.fit]) if (v) sourceIds.add(v.sourceId);
    }
    return {
      species: { id: record.speciesId, formula: record.formula, name: record.name },
      phase: record.phase,
      polymorph: record.polymorph,
      release: release.label,
      units: request.units,
      fit: record.fit && species.heatCapacitySource === 'fit'
        ? { id: record.fit.id, form: record.fit.form, tMin: record.fit.tMin, tMax: record.fit.tMax, source: record.fit.sourceKey }
        : null,
      rows,
      sources: await this.sources([...sourceIds]),
      notes: [...notes],
    };
  }

  /** The species phase asked for, among those holding data in the release, with its recommended data. */
  private async choosePhase(release: ResolvedRelease, request: PropertyRequest): Promise<PhaseThermoRecord> {
    const phases = [...(await loadSpeciesThermo(this.dataSource.manager, release.id, request.speciesId)).values()].sort(
      (a, b) => compareText(a.phase, b.phase) || (a.polymorph === b.polymorph ? 0 : a.polymorph === null ? -1 : b.polymorph === null ? 1 : compareText(a.polymorph, b.polymorph)),
    );
    if (phases.length === 0) {
      const exists = (await this.dataSource.query(`SELECT 1 FROM species WHERE id = $1`, [request.speciesId])).length > 0;
      throw new NotFoundError(exists ? `Species ${request.speciesId} holds no data in release ${release.label}` : `No species ${request.speciesId}`);
    }
    const labels = phases.map((p) => phaseLabel(p.phase, p.polymorph)).join('; ');
    let candidates = phases;
    if (request.phase) {
      candidates = candidates.filter((p) => p.phase === request.phase!.phase && (request.phase!.polymorph === null || p.polymorph === request.phase!.polymorph));
    }
    if (request.polymorph !== undefined) candidates = candidates.filter((p) => p.polymorph === request.polymorph);
    if (candidates.length === 0) {
      const asked = request.phase ? phaseLabel(request.phase.phase, request.polymorph ?? request.phase.polymorph) : `polymorph ${request.polymorph}`;
      throw new NotFoundError(`This species holds no data for ${asked} in release ${release.label} (it holds: ${labels})`);
    }
    if (candidates.length > 1) {
      throw new BadRequestError(
        request.phase ? `Several polymorphs hold data; give polymorph (one of: ${labels})` : `phase is required: this species holds data for ${labels}`,
        { parameter: request.phase ? 'polymorph' : 'phase', phases: candidates.map((p) => ({ phase: p.phase, polymorph: p.polymorph })) },
      );
    }
    return candidates[0];
  }

  /** Out-of-range temperatures are a 422 naming them, unless extrapolation was asked for. */
  private checkRange(species: ComputableSpecies, request: PropertyRequest, release: ResolvedRelease): void {
    const outside = request.temperatures.filter((t) => !inRange(t, species));
    if (outside.length === 0) return;
    const shown = outside.slice(0, 10).join(', ') + (outside.length > 10 ? ', …' : '');
    if (species.heatCapacitySource === 'none') {
      throw new UnprocessableError(
        `${species.label} has neither a heat-capacity fit nor a Cp° value in release ${release.label}: properties are available at 298.15 K only (asked for T = ${shown} K)`,
        { parameter: 'T', temperatures: outside, tMin: T_REF, tMax: T_REF },
      );
    }
    if (request.extrapolate) return;
    const what = species.heatCapacitySource === 'fit'
      ? `the valid range ${species.tMin}–${species.tMax} K of the heat-capacity fit of ${species.label}`
      : `298.15 K, the only temperature the Cp° value of ${species.label} covers (release ${release.label} holds no heat-capacity fit for it)`;
    throw new UnprocessableError(`T = ${shown} K lies outside ${what}; pass extrapolate=true to extrapolate (rows are then flagged)`, {
      parameter: 'T',
      temperatures: outside,
      tMin: species.tMin,
      tMax: species.tMax,
    });
  }

  /** The reference states the formation quantities need, or null (with a note) when one is missing. */
  private formationInputs(species: ComputableSpecies, references: ReferenceRecords, notes: Set<string>, release: ResolvedRelease): FormationInputs | null {
    if (!species.hasFormationEnthalpy) {
      notes.add(`ΔfH°, ΔfG° and log10 Kf are not given: release ${release.label} holds no ΔfH°(298.15 K) for ${species.label}.`);
      return null;
    }
    if (!species.hasEntropy) {
      notes.add(`ΔfG° and log10 Kf are not given: release ${release.label} holds no S° for ${species.label}.`);
      return null;
    }
    const participants: FormationInputs['participants'] = [];
    const wanted = Object.keys(species.record.composition);
    if (species.record.charge !== 0) wanted.push('e-');
    const missing: string[] = [];
    for (const symbol of wanted) {
      const ref = references.get(symbol);
      if (!ref || !ref.hasEntropy) {
        missing.push(symbol === 'e-' ? 'the electron (ions need it)' : symbol);
        continue;
      }
      const atoms = symbol === 'e-' ? 1 : ref.record.composition[symbol];
      participants.push({ symbol, species: ref, reference: { label: ref.label, atoms, entropy: ref.data.entropy, heatCapacity: ref.data.heatCapacity, heatCapacityUncertainty: ref.data.heatCapacityUncertainty } });
      for (const note of ref.notes) notes.add(note);
    }
    if (missing.length > 0) {
      notes.add(`ΔfH°(T), ΔfG°(T) and log10 Kf are not given: release ${release.label} holds no reference-state data (S°) for ${missing.join(', ')}.`);
      return null;
    }
    const known = (reference: boolean) => {
      const enthalpy = species.uncertaintyKnown.formationEnthalpy && (reference || (species.uncertaintyKnown.heatCapacity && participants.every((p) => p.species.uncertaintyKnown.heatCapacity)));
      const gibbs = enthalpy && species.uncertaintyKnown.entropy && participants.every((p) => p.species.uncertaintyKnown.entropy);
      return { enthalpy, gibbs };
    };
    return { participants, uncertaintyKnown: known };
  }

  /** ΔfH°, ΔfG°, log10 Kf at T, or null with a note when a reference state cannot be evaluated there. */
  private formationAt(species: ComputableSpecies, inputs: FormationInputs, t: number, extrapolate: boolean, notes: Set<string>): SpeciesAtTemperature | null {
    const blocked = inputs.participants.filter((p) => !inRange(t, p.species) && (!extrapolate || p.species.heatCapacitySource === 'none'));
    if (blocked.length > 0) {
      for (const p of blocked) {
        notes.add(p.species.heatCapacitySource === 'fit'
          ? `ΔfH°, ΔfG° and log10 Kf are not given outside ${p.species.tMin}–${p.species.tMax} K, the valid range of the heat-capacity fit of ${p.species.label} (reference state of ${p.symbol}).`
          : `ΔfH°, ΔfG° and log10 Kf are given at 298.15 K only: the release holds no heat-capacity fit for ${p.species.label} (reference state of ${p.symbol}).`);
      }
      return null;
    }
    const references: Record<string, ElementReference> = {};
    for (const p of inputs.participants) references[p.symbol] = p.reference;
    return speciesAtTemperature(species.data, t, references, { extrapolate: true });
  }

  private noteUnknownUncertainties(species: ComputableSpecies, notes: Set<string>): void {
    const r = species.record;
    for (const [value, symbol] of [[r.dfH, 'ΔfH°'], [r.S, 'S°']] as const) {
      if (value && value.standardUncertainty === null) {
        notes.add(`${symbol} of ${speciesLabel(r)} (${value.sourceKey}) has no stated uncertainty; uncertainties that depend on it are null.`);
      }
    }
    if (species.heatCapacitySource !== 'none' && !species.uncertaintyKnown.heatCapacity) {
      notes.add(`No uncertainty is stated for the heat capacity of ${species.label}; uncertainties away from 298.15 K that depend on it are null.`);
    }
  }

  private async sources(ids: string[]): Promise<SourceRef[]> {
    if (ids.length === 0) return [];
    const rows = await this.dataSource.query(`SELECT ${SOURCE_COLUMNS} FROM sources src WHERE src.id = ANY($1::uuid[]) ORDER BY src.short_key`, [ids]);
    return rows.map(sourceRef);
  }
}

interface FormationInputs {
  participants: { symbol: string; species: ComputableSpecies; reference: ElementReference }[];
  uncertaintyKnown(reference: boolean): { enthalpy: boolean; gibbs: boolean };
}

/** Byte order, as PostgreSQL's C collation sorts (the order phases were always listed in). */
function compareText(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}

function scale(value: number | null, factor: number): number | null {
  return value === null ? null : value / factor;
}
