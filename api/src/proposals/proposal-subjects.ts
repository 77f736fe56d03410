import type { EntityManager } from 'typeorm';
import { parseFormula } from '../thermo/formula';
import { hillFormula } from '../thermo/formula-format';
import type { PhaseCode } from '../species/phase-code';
import type { FitForm, Quantity, TransitionKind, UncertaintyKind } from '../values/value-vocabulary';
import type { ProposalItemKind } from './proposal-vocabulary';
import { checkItemPayload, type PayloadReferences } from './proposal-item-payloads';
import type { EntryProblem } from './value-entry';

/**
 * What proposal items are about. Items name their subject by id (an existing species phase, value
 * or fit) or by species name plus phase, which may be a species or phase that an earlier item of
 * the same proposal adds. Resolution runs on the whole ordered item list against an in-memory view
 * of the catalogue, so it is as fast for a 100 000-row import as for one item.
 */

export interface CatalogueSpecies {
  id: string;
  formula: string;
  hillFormula: string;
  charge: number;
  name: string;
  synonyms: string[];
  composition: Record<string, number>;
  casRn: string | null;
  inchikey: string | null;
}

export interface CataloguePhase {
  id: string;
  speciesId: string;
  phase: PhaseCode;
  polymorph: string | null;
  isReferenceState: boolean;
}

export interface CatalogueValue {
  id: string;
  lineageId: string;
  versionNo: number;
  speciesPhaseId: string;
  quantity: Quantity;
  transitionKind: TransitionKind | null;
  isRetired: boolean;
  /** no later version supersedes it */
  isLatest: boolean;
  sourceId: string;
  valueSi: number;
  uncertaintySi: number | null;
  uncertaintyKind: UncertaintyKind | null;
  coverageFactor: number | null;
  temperatureK: number;
  pressurePa: number;
}

export interface CatalogueFit {
  id: string;
  lineageId: string;
  versionNo: number;
  speciesPhaseId: string;
  isRetired: boolean;
  isLatest: boolean;
  form: FitForm;
  tMinK: number;
  tMaxK: number;
  ranges: unknown;
}

const SPECIES_COLUMNS = `id, formula, hill_formula AS "hillFormula", charge, name, synonyms, composition, cas_rn AS "casRn", inchikey`;
const PHASE_COLUMNS = `id, species_id AS "speciesId", phase, polymorph, is_reference_state AS "isReferenceState"`;

/**
 * The species and phases of the catalogue, and the values and fits items point at: all of them
 * (`load`), or only those some items can name (a new view filled by the `loadSpecies…` methods).
 */
export class CatalogueView {
  readonly speciesById = new Map<string, CatalogueSpecies>();
  readonly phaseById = new Map<string, CataloguePhase>();
  readonly valueById = new Map<string, CatalogueValue>();
  readonly fitById = new Map<string, CatalogueFit>();
  private readonly byName = new Map<string, CatalogueSpecies[]>();
  private readonly byHillAndCharge = new Map<string, CatalogueSpecies[]>();
  private readonly phasesBySpecies = new Map<string, CataloguePhase[]>();
  /** each catalogue species and phase as items see it, made once (thousands of items share them) */
  private readonly subjectSpecies = new Map<CatalogueSpecies, SubjectSpecies>();
  private readonly subjectPhases = new Map<CataloguePhase, SubjectPhase>();

  static async load(manager: EntityManager, refs: { valueIds?: string[]; fitIds?: string[] } = {}): Promise<CatalogueView> {
    const view = new CatalogueView();
    const species: CatalogueSpecies[] = await manager.query(`SELECT ${SPECIES_COLUMNS} FROM species`);
    for (const s of species) view.addSpecies(s);
    const phases: CataloguePhase[] = await manager.query(`SELECT ${PHASE_COLUMNS} FROM species_phases`);
    for (const p of phases) view.addPhase(p);
    await view.loadValues(manager, refs.valueIds ?? []);
    await view.loadFits(manager, refs.fitIds ?? []);
    return view;
  }

  /**
   * Adds, with all their phases, the species of some Hill formulas (any charge; as `hillFormula`
   * writes them): all of them for `hillFormulas`, and for `namedHillFormulas` those whose name or
   * a synonym is one of `names`, case ignored. What an import needs to match its rows' formulas
   * and names.
   */
  async loadSpeciesOfFormulas(manager: EntityManager, wanted: { hillFormulas: string[]; namedHillFormulas: string[]; names: string[] }): Promise<void> {
    if (wanted.hillFormulas.length === 0 && wanted.namedHillFormulas.length === 0) return;
    // One scan of the three indexes (Hill formula, lower(name), lowered synonyms), OR-ed: cheap enough that PostgreSQL plans no parallel workers.
    await this.loadSpeciesWhere(
      manager,
      `hill_formula = ANY($1::text[])
       OR (hill_formula = ANY($2::text[]) AND lower(name) = ANY($3::text[]))
       OR (kx_lower_all(synonyms) && $3::text[] AND hill_formula = ANY($2::text[])
           AND EXISTS (SELECT 1 FROM unnest(synonyms) AS synonym WHERE lower(synonym) = ANY($3::text[])))`,
      [[...new Set(wanted.hillFormulas)], [...new Set(wanted.namedHillFormulas)], caseKeys(wanted.names)],
    );
  }

  /**
   * Adds, with all their phases, every species that `speciesNamed` could answer for these texts
   * (name, formula or synonym; case and surrounding spaces ignored).
   */
  async loadSpeciesNamed(manager: EntityManager, texts: string[]): Promise<void> {
    if (texts.length === 0) return;
    await this.loadSpeciesWhere(
      manager,
      `lower(btrim(name)) = ANY($1::text[]) OR lower(btrim(formula)) = ANY($1::text[])
       OR EXISTS (SELECT 1 FROM unnest(synonyms) AS synonym WHERE lower(btrim(synonym)) = ANY($1::text[]))`,
      [caseKeys(texts.map((t) => t.trim()))],
    );
  }

  /** Adds the species that `where` selects, and all their phases. */
  private async loadSpeciesWhere(manager: EntityManager, where: string, parameters: unknown[]): Promise<void> {
    const species: CatalogueSpecies[] = await manager.query(`SELECT ${SPECIES_COLUMNS} FROM species WHERE ${where}`, parameters);
    const added = species.filter((s) => !this.speciesById.has(s.id));
    for (const s of added) this.addSpecies(s);
    if (added.length === 0) return;
    const phases: CataloguePhase[] = await manager.query(`SELECT ${PHASE_COLUMNS} FROM species_phases WHERE species_id = ANY($1::uuid[])`, [added.map((s) => s.id)]);
    for (const p of phases) this.addPhase(p);
  }

  async loadValues(manager: EntityManager, ids: string[]): Promise<void> {
    const wanted = [...new Set(ids)].filter((id) => !this.valueById.has(id));
    if (wanted.length === 0) return;
    const rows: CatalogueValue[] = await manager.query(
      `SELECT v.id, v.lineage_id AS "lineageId", v.version_no AS "versionNo", v.species_phase_id AS "speciesPhaseId", v.quantity,
              v.transition_kind AS "transitionKind", v.is_retired AS "isRetired",
              NOT EXISTS (SELECT 1 FROM thermo_values n WHERE n.supersedes_id = v.id) AS "isLatest",
              v.source_id AS "sourceId", v.value_si AS "valueSi", v.uncertainty_si AS "uncertaintySi", v.uncertainty_kind AS "uncertaintyKind",
              v.coverage_factor AS "coverageFactor", v.temperature_k AS "temperatureK", v.pressure_pa AS "pressurePa"
         FROM thermo_values v WHERE v.id = ANY($1::uuid[])`,
      [wanted],
    );
    for (const r of rows) this.valueById.set(r.id, r);
  }

  async loadFits(manager: EntityManager, ids: string[]): Promise<void> {
    const wanted = [...new Set(ids)].filter((id) => !this.fitById.has(id));
    if (wanted.length === 0) return;
    const rows: CatalogueFit[] = await manager.query(
      `SELECT f.id, f.lineage_id AS "lineageId", f.version_no AS "versionNo", f.species_phase_id AS "speciesPhaseId", f.is_retired AS "isRetired",
              NOT EXISTS (SELECT 1 FROM heat_capacity_fits n WHERE n.supersedes_id = f.id) AS "isLatest",
              f.form, f.t_min_k AS "tMinK", f.t_max_k AS "tMaxK", f.ranges
         FROM heat_capacity_fits f WHERE f.id = ANY($1::uuid[])`,
      [wanted],
    );
    for (const r of rows) this.fitById.set(r.id, r);
  }

  addSpecies(s: CatalogueSpecies): void {
    if (this.speciesById.has(s.id)) return;
    this.speciesById.set(s.id, s);
    const sameFormula = this.byHillAndCharge.get(hillKey(s.hillFormula, s.charge));
    if (sameFormula) sameFormula.push(s);
    else this.byHillAndCharge.set(hillKey(s.hillFormula, s.charge), [s]);
    for (const key of speciesKeys(s.name, s.formula, s.synonyms)) {
      const list = this.byName.get(key) ?? [];
      if (!list.includes(s)) list.push(s);
      this.byName.set(key, list);
    }
  }

  addPhase(p: CataloguePhase): void {
    this.phaseById.set(p.id, p);
    const list = this.phasesBySpecies.get(p.speciesId) ?? [];
    list.push(p);
    this.phasesBySpecies.set(p.speciesId, list);
  }

  /** Species whose name, synonym or formula as entered is `text` (case-insensitive for names). */
  speciesNamed(text: string): CatalogueSpecies[] {
    return this.byName.get(nameKey(text)) ?? [];
  }

  /** Species of this Hill formula (as `hillFormula` writes it) and charge. */
  speciesOfFormula(hill: string, charge: number): readonly CatalogueSpecies[] {
    return this.byHillAndCharge.get(hillKey(hill, charge)) ?? [];
  }

  phaseOf(speciesId: string, phase: PhaseCode, polymorph: string | null): CataloguePhase | undefined {
    return (this.phasesBySpecies.get(speciesId) ?? []).find((p) => p.phase === phase && (p.polymorph ?? null) === (polymorph ?? null));
  }

  phasesOf(speciesId: string): CataloguePhase[] {
    return this.phasesBySpecies.get(speciesId) ?? [];
  }

  /** A catalogue species as an item's subject (shared, not to be changed). */
  asSubject(s: CatalogueSpecies): SubjectSpecies {
    let subject = this.subjectSpecies.get(s);
    if (!subject) {
      subject = { id: s.id, itemId: null, formula: s.formula, hillFormula: s.hillFormula, name: s.name, composition: s.composition, charge: s.charge };
      this.subjectSpecies.set(s, subject);
    }
    return subject;
  }

  /** A catalogue phase as an item's subject (shared, not to be changed). */
  asSubjectPhase(p: CataloguePhase): SubjectPhase {
    let subject = this.subjectPhases.get(p);
    if (!subject) {
      subject = { id: p.id, itemId: null, phase: p.phase, polymorph: p.polymorph, isReferenceState: p.isReferenceState };
      this.subjectPhases.set(p, subject);
    }
    return subject;
  }
}

const nameKey = (text: string) => text.trim().toLowerCase();
const hillKey = (hill: string, charge: number) => `${hill}|${charge}`;

/**
 * Texts to compare with PostgreSQL's `lower(…)` of names: each as JavaScript lowers it (as
 * `nameKey` does), the two agreeing on the letters names are written in, and as given, for a
 * character that one of them leaves as it is.
 */
function caseKeys(texts: string[]): string[] {
  return [...new Set(texts.flatMap((t) => [t.toLowerCase(), t]))];
}

function speciesKeys(name: string, formula: string, synonyms: string[]): string[] {
  return [name, formula, ...synonyms].map(nameKey);
}

/** An item as stored, the part resolution needs. */
export interface ItemInput {
  id: string;
  position: number;
  kind: ProposalItemKind;
  payload: Record<string, unknown>;
  sourceId: string | null;
}

/** The reference columns of an item row. */
export interface ItemReferenceColumns {
  speciesId: string | null;
  speciesPhaseId: string | null;
  targetValueId: string | null;
  targetFitId: string | null;
}

/**
 * An item whose payload does not name its subject but whose row does (items written by the demo
 * loader, or by tools that fill the columns): the payload is read as if it named the column's record.
 */
export function withColumnReferences(item: ItemInput, columns: ItemReferenceColumns): ItemInput {
  const p = item.payload ?? {};
  const has = (key: string) => p[key] !== undefined && p[key] !== null && p[key] !== '';
  const extra: Record<string, unknown> = {};
  if ((item.kind === 'add_value' || item.kind === 'add_fit') && !has('speciesPhaseId') && !has('species') && !has('speciesId') && columns.speciesPhaseId) {
    extra.speciesPhaseId = columns.speciesPhaseId;
  }
  if (item.kind === 'add_phase' && !has('species') && !has('speciesId') && columns.speciesId) extra.speciesId = columns.speciesId;
  if ((item.kind === 'revise_value' || item.kind === 'retire_value' || item.kind === 'recommend') && !has('valueId') && !has('fitId') && columns.targetValueId) extra.valueId = columns.targetValueId;
  if ((item.kind === 'replace_fit' || item.kind === 'recommend') && !has('fitId') && !has('valueId') && columns.targetFitId) extra.fitId = columns.targetFitId;
  return Object.keys(extra).length === 0 ? item : { ...item, payload: { ...p, ...extra } };
}

/** A species as an item sees it: in the catalogue, or added by an add_species item. */
export interface SubjectSpecies {
  /** catalogue id, or null when an item of this proposal adds it */
  id: string | null;
  /** the add_species item that adds it */
  itemId: string | null;
  formula: string;
  hillFormula: string;
  name: string;
  composition: Record<string, number>;
  charge: number;
}

export interface SubjectPhase {
  id: string | null;
  itemId: string | null;
  phase: PhaseCode;
  polymorph: string | null;
  isReferenceState: boolean;
}

export interface ResolvedItem {
  item: ItemInput;
  problems: EntryProblem[];
  refs: PayloadReferences;
  species?: SubjectSpecies;
  phase?: SubjectPhase;
  quantity?: Quantity;
  transitionKind?: TransitionKind | null;
  targetValue?: CatalogueValue;
  targetFit?: CatalogueFit;
}

/** The database columns an item row carries for what it refers to. */
export function itemColumns(r: ResolvedItem): { speciesId: string | null; speciesPhaseId: string | null; targetValueId: string | null; targetFitId: string | null } {
  return {
    speciesId: r.species?.id ?? null,
    speciesPhaseId: r.phase?.id ?? null,
    targetValueId: r.targetValue?.id ?? null,
    targetFitId: r.targetFit?.id ?? null,
  };
}

/** What resolution remembers from earlier items: a long item list can be resolved in parts, in position order. */
export interface ResolutionState {
  newSpecies: SubjectSpecies[];
  newPhases: (SubjectPhase & { speciesKey: string })[];
  /** lineage → position of the item that revises, retires or replaces it */
  targetedValues: Map<string, number>;
  targetedFits: Map<string, number>;
}

export function newResolutionState(): ResolutionState {
  return { newSpecies: [], newPhases: [], targetedValues: new Map(), targetedFits: new Map() };
}

/**
 * Resolves every item in position order. An item may refer to a species or phase that an earlier
 * item adds. Problems name the field; an item with problems still gets what could be resolved.
 * A long list can come in parts, in position order, with one `state` for all of them.
 */
export function resolveItems(items: ItemInput[], catalogue: CatalogueView, state: ResolutionState = newResolutionState()): ResolvedItem[] {
  const ordered = [...items].sort((a, b) => a.position - b.position);
  const { newSpecies, newPhases, targetedValues, targetedFits } = state;
  const results: ResolvedItem[] = [];

  const findSpecies = (refs: PayloadReferences, problems: EntryProblem[]): SubjectSpecies | undefined => {
    if (refs.speciesId) {
      const s = catalogue.speciesById.get(refs.speciesId);
      if (!s) problems.push({ field: 'payload.speciesId', message: `no species ${refs.speciesId} in the catalogue` });
      return s ? catalogue.asSubject(s) : undefined;
    }
    if (!refs.speciesName) return undefined;
    const key = nameKey(refs.speciesName);
    const pending = newSpecies.filter((s) => nameKey(s.name) === key || nameKey(s.formula) === key);
    const existing = catalogue.speciesNamed(refs.speciesName);
    const candidates = [...pending, ...existing.map((e) => catalogue.asSubject(e))];
    if (candidates.length === 0) {
      problems.push({ field: 'payload.species', message: `no species named "${refs.speciesName}" in the catalogue or added earlier in this proposal` });
      return undefined;
    }
    if (candidates.length > 1) {
      problems.push({ field: 'payload.species', message: `"${refs.speciesName}" names ${candidates.length} species (${candidates.map((c) => `${c.name}, ${c.hillFormula}`).join('; ')}); give speciesId` });
      return undefined;
    }
    return candidates[0];
  };

  const findPhase = (species: SubjectSpecies, phase: PhaseCode, polymorph: string | null, problems: EntryProblem[]): SubjectPhase | undefined => {
    const speciesKey = species.id ?? `item:${species.itemId}`;
    const pending = newPhases.find((p) => p.speciesKey === speciesKey && p.phase === phase && p.polymorph === polymorph);
    if (pending) return pending;
    if (species.id) {
      const existing = catalogue.phaseOf(species.id, phase, polymorph);
      if (existing) return catalogue.asSubjectPhase(existing);
    }
    const label = polymorph ? `${phase}, ${polymorph}` : phase;
    problems.push({ field: 'payload.phase', message: `${species.name} has no phase ${label} yet: add an add_phase item before this one` });
    return undefined;
  };

  for (const item of ordered) {
    // The target's quantity decides the units a revision may use, so the target is looked up first.
    const preliminary = checkItemPayload(item.kind, item.payload, item.sourceId);
    const targetValue = preliminary.refs.targetValueId ? catalogue.valueById.get(preliminary.refs.targetValueId) : undefined;
    // The check's own list of problems, made for this item, gathers the rest too.
    const { problems, refs } = item.kind === 'revise_value' && targetValue
      ? checkItemPayload(item.kind, item.payload, item.sourceId, { quantity: targetValue.quantity, transitionKind: targetValue.transitionKind })
      : preliminary;
    const result: ResolvedItem = { item, problems, refs };
    results.push(result);

    switch (item.kind) {
      case 'add_species': {
        if (problems.length > 0) break;
        const formulaText = String(item.payload.formula).trim();
        const parsed = parseFormula(formulaText);
        const name = String(item.payload.name).trim();
        const hill = hillFormula(parsed);
        const inCatalogue = catalogue.speciesNamed(name).find((s) => s.hillFormula === hill && s.charge === parsed.charge);
        const inProposal = newSpecies.find((s) => nameKey(s.name) === nameKey(name) && s.hillFormula === hill && s.charge === parsed.charge);
        if (inCatalogue || inProposal) {
          problems.push({ field: 'payload.name', message: inCatalogue
            ? `${inCatalogue.name} (${inCatalogue.hillFormula}) is already in the catalogue (${inCatalogue.id})`
            : `${name} (${hill}) is already added by an earlier item of this proposal` });
          break;
        }
        const cas = item.payload.casRn as string | undefined;
        const casClash = cas ? [...catalogue.speciesById.values()].find((s) => s.casRn === cas) : undefined;
        if (casClash) problems.push({ field: 'payload.casRn', message: `CAS RN ${cas} already belongs to ${casClash.name} (${casClash.id})` });
        const inchikey = item.payload.inchikey as string | undefined;
        const keyClash = inchikey ? [...catalogue.speciesById.values()].find((s) => s.inchikey === inchikey) : undefined;
        if (keyClash) problems.push({ field: 'payload.inchikey', message: `InChIKey ${inchikey} already belongs to ${keyClash.name} (${keyClash.id})` });
        const species: SubjectSpecies = { id: null, itemId: item.id, formula: formulaText, hillFormula: hill, name, composition: { ...parsed.elements }, charge: parsed.charge };
        if (problems.length === 0) newSpecies.push(species);
        result.species = species;
        break;
      }
      case 'add_phase': {
        const species = findSpecies(refs, problems);
        if (!species || !refs.phase) break;
        result.species = species;
        const speciesKey = species.id ?? `item:${species.itemId}`;
        const polymorph = refs.polymorph ?? null;
        const exists = (species.id && catalogue.phaseOf(species.id, refs.phase, polymorph)) || newPhases.some((p) => p.speciesKey === speciesKey && p.phase === refs.phase && p.polymorph === polymorph);
        if (exists) {
          problems.push({ field: 'payload.phase', message: `${species.name} already has the phase ${polymorph ? `${refs.phase}, ${polymorph}` : refs.phase}` });
          break;
        }
        const phase = { id: null, itemId: item.id, phase: refs.phase, polymorph, isReferenceState: item.payload.isReferenceState === true, speciesKey };
        newPhases.push(phase);
        result.phase = phase;
        break;
      }
      case 'add_value':
      case 'add_fit': {
        if (refs.speciesPhaseId) {
          const p = catalogue.phaseById.get(refs.speciesPhaseId);
          if (!p) {
            problems.push({ field: 'payload.speciesPhaseId', message: `no species phase ${refs.speciesPhaseId} in the catalogue` });
            break;
          }
          result.species = catalogue.asSubject(catalogue.speciesById.get(p.speciesId)!);
          result.phase = catalogue.asSubjectPhase(p);
        } else {
          const species = findSpecies(refs, problems);
          if (species && refs.phase) {
            result.species = species;
            result.phase = findPhase(species, refs.phase, refs.polymorph ?? null, problems);
          }
        }
        if (item.kind === 'add_value') {
          result.quantity = item.payload.quantity as Quantity;
          result.transitionKind = (item.payload.transitionKind as TransitionKind | undefined) ?? null;
        } else {
          result.quantity = 'Cp';
        }
        break;
      }
      case 'revise_value':
      case 'retire_value':
      case 'recommend': {
        const valueId = refs.targetValueId;
        if (valueId) {
          const v = catalogue.valueById.get(valueId);
          if (!v) {
            problems.push({ field: 'payload.valueId', message: `no value ${valueId}` });
            break;
          }
          result.targetValue = v;
          describeTarget(result, catalogue, v.speciesPhaseId);
          result.quantity = v.quantity;
          result.transitionKind = v.transitionKind;
          if (v.isRetired) problems.push({ field: 'payload.valueId', message: `value ${valueId} is a retirement record; its lineage is retired` });
          else if (!v.isLatest) problems.push({ field: 'payload.valueId', message: `value ${valueId} (version ${v.versionNo}) has been superseded; ${item.kind === 'recommend' ? 'recommend' : 'revise or retire'} the latest version` });
          if (item.kind !== 'recommend') {
            const earlier = targetedValues.get(v.lineageId);
            if (earlier !== undefined) problems.push({ field: 'payload.valueId', message: `item ${earlier} of this proposal already revises or retires this value` });
            else targetedValues.set(v.lineageId, item.position);
          }
        }
        if (item.kind === 'recommend' && refs.targetFitId) resolveFit(result, refs.targetFitId, catalogue, problems, null);
        break;
      }
      case 'replace_fit':
        if (refs.targetFitId) resolveFit(result, refs.targetFitId, catalogue, problems, targetedFits);
        result.quantity = 'Cp';
        break;
    }
  }
  return results;
}

function resolveFit(result: ResolvedItem, fitId: string, catalogue: CatalogueView, problems: EntryProblem[], targeted: Map<string, number> | null): void {
  const f = catalogue.fitById.get(fitId);
  if (!f) {
    problems.push({ field: 'payload.fitId', message: `no heat-capacity fit ${fitId}` });
    return;
  }
  result.targetFit = f;
  describeTarget(result, catalogue, f.speciesPhaseId);
  if (f.isRetired) problems.push({ field: 'payload.fitId', message: `fit ${fitId} is a retirement record` });
  else if (!f.isLatest) problems.push({ field: 'payload.fitId', message: `fit ${fitId} (version ${f.versionNo}) has been superseded; replace the latest version` });
  if (targeted) {
    const earlier = targeted.get(f.lineageId);
    if (earlier !== undefined) problems.push({ field: 'payload.fitId', message: `item ${earlier} of this proposal already replaces this fit` });
    else targeted.set(f.lineageId, result.item.position);
  }
}

function describeTarget(result: ResolvedItem, catalogue: CatalogueView, speciesPhaseId: string): void {
  const p = catalogue.phaseById.get(speciesPhaseId);
  if (!p) return;
  result.phase = catalogue.asSubjectPhase(p);
  const s = catalogue.speciesById.get(p.speciesId);
  if (s) result.species = catalogue.asSubject(s);
}


/** Value and fit ids the items refer to, to load before resolving. */
export function referencedIds(items: ItemInput[]): { valueIds: string[]; fitIds: string[] } {
  const valueIds: string[] = [];
  const fitIds: string[] = [];
  const uuid = /^[0-9a-f-]{36}$/i;
  for (const item of items) {
    const v = item.payload?.valueId;
    const f = item.payload?.fitId;
    if (typeof v === 'string' && uuid.test(v)) valueIds.push(v.toLowerCase());
    if (typeof f === 'string' && uuid.test(f)) fitIds.push(f.toLowerCase());
  }
  return { valueIds, fitIds };
}
