import { getRandomValues } from 'node:crypto';
import { v7 as uuidV7 } from 'uuid';
import { hillFormula } from '../thermo/formula-format';
import { tryParseFormula } from '../thermo/formula';
import { normalizeDoi } from '../sources/doi';
import { PHASE_CODES, type PhaseCode } from '../species/phase-code';
import { itemColumns, newResolutionState, resolveItems, type CatalogueSpecies, type CatalogueView, type ItemInput, type ResolutionState } from '../proposals/proposal-subjects';
import type { Quantity } from '../values/value-vocabulary';
import type { ImportProblem, ImportRow } from './import-files';

type ParsedFormulaOf = Extract<ReturnType<typeof tryParseFormula>, { ok: true }>['formula'];

/**
 * Turns import rows into the items of one draft proposal: an add_value item per row, plus
 * add_species and add_phase items for species (named in the row) and phases not yet in the
 * catalogue. Every problem is reported with its line; the items are then resolved exactly as
 * items added by hand would be, so an import can hold nothing a steward could not enter. Item ids
 * are time-ordered (UUID version 7, RFC 9562): tens of thousands of new items then land at the end
 * of the primary-key index instead of all over it.
 */

/** Random bytes for item ids, drawn 16 KiB at a time (uuid's own source draws 16 bytes per id, ten times slower). */
let randomPool = new Uint8Array(0);
let randomAt = 0;
function sixteenRandomBytes(): Uint8Array {
  if (randomAt + 16 > randomPool.length) {
    randomPool = getRandomValues(new Uint8Array(16_384));
    randomAt = 0;
  }
  randomAt += 16;
  return randomPool.subarray(randomAt - 16, randomAt);
}

const timeOrderedId = () => uuidV7({ rng: sixteenRandomBytes });

const QUANTITY_SPELLINGS: Readonly<Record<string, Quantity>> = {
  dfh: 'dfH', 'δfh°': 'dfH', 'δfh': 'dfH', 'δfh°(298.15 k)': 'dfH',
  s: 'S', 's°': 'S',
  cp: 'Cp', 'cp°': 'Cp', 'c_p': 'Cp',
  dfg: 'dfG', 'δfg°': 'dfG', 'δfg': 'dfG',
  dtrsh: 'dtrsH', 'δtrsh': 'dtrsH', 'δtrsh°': 'dtrsH',
};

/** Payload fields of an add_value item → the column a steward wrote them in. */
const COLUMN_OF: Readonly<Record<string, string>> = {
  'payload.value': 'value', 'payload.unit': 'unit', 'payload.uncertainty': 'uncertainty', 'payload.uncertaintyKind': 'uncertaintyKind',
  'payload.coverageFactor': 'coverageFactor', 'payload.temperatureK': 'temperature', 'payload.pressurePa': 'pressure', 'payload.method': 'method',
  'payload.levelOfTheory': 'methodDetail', 'payload.quantity': 'quantity', 'payload.transitionKind': 'transition', 'payload.phase': 'phase',
  'payload.polymorph': 'polymorph', 'payload.species': 'name', 'payload.speciesId': 'formula', 'payload.speciesPhaseId': 'phase', 'sourceId': 'sourceKey',
  'payload.formula': 'formula', 'payload.name': 'name', 'payload.sourceLocator': 'sourceLocator', 'payload.notes': 'notes',
};

export interface ImportSources {
  byKey: Map<string, string>;
  byDoi: Map<string, string>;
}

/** What the rows refer to, to load from the database before checking them. */
export interface ImportReferences {
  /** Hill formulas (as `hillFormula` writes them) of rows that give no name: any species of these may be meant */
  hillFormulas: string[];
  /** Hill formulas of rows that give a name: only species of these answering to one of `names` may be meant */
  namedHillFormulas: string[];
  names: string[];
  sourceKeys: string[];
  /** DOIs as normalised */
  dois: string[];
  /** the rows' formulas as read, for `draftImport` to reuse */
  formulas: FormulaReader;
}

/**
 * A value row as drafted, with what makes two rows the same value: the same quantity of one
 * species phase from one source at the same temperature (Cp at several temperatures is not a repeat).
 */
export interface DraftValue {
  item: ItemInput;
  line: number;
  phaseKey: string;
  quantity: Quantity;
  transition: string | null;
  sourceId: string | undefined;
  temperature: number;
}

/** The rows as items, before their subjects are resolved against the catalogue. */
export interface DraftImport {
  /** in position order: items[i] has position items[0].position + i */
  items: ItemInput[];
  /** lines[i]: the line items[i] comes from */
  lines: number[];
  values: DraftValue[];
  problems: ImportProblem[];
  counts: { species: number; phases: number; values: number };
}

export interface PreparedImport {
  items: ItemInput[];
  /** columns[i]: the reference columns (species, species phase) of items[i], as resolved */
  columns: ReturnType<typeof itemColumns>[];
  problems: ImportProblem[];
  counts: { species: number; phases: number; values: number };
}

/**
 * What checking remembers from one part of a file to the next, so that a long file can be checked
 * (and written) in parts: the species and phases it adds, the next position, the values seen.
 */
export interface ImportState {
  newSpecies: Map<string, { item: ItemInput; line: number }>;
  newPhases: Map<string, { item: ItemInput; line: number }>;
  nextPosition: number;
  resolution: ResolutionState;
  /** the values seen so far, by species phase (`DraftValue.phaseKey`) and temperature */
  seen: Map<string, Map<number, DraftValue | DraftValue[]>>;
}

export function newImportState(): ImportState {
  return { newSpecies: new Map(), newPhases: new Map(), nextPosition: 1, resolution: newResolutionState(), seen: new Map() };
}

/** "100000", "1e5 Pa", "100 kPa", "1 bar", "1 atm", "101.325 kPa" → Pa; undefined when unreadable. */
export function readPressure(text: string): number | undefined {
  const match = /^\s*([+]?\d+(?:\.\d*)?(?:[eE][+-]?\d+)?)\s*(pa|kpa|bar|atm)?\s*$/i.exec(text);
  if (!match) return undefined;
  const n = Number(match[1]);
  switch ((match[2] ?? 'pa').toLowerCase()) {
    case 'kpa': return Math.round(n * 1000 * 1e6) / 1e6;
    case 'bar': return Math.round(n * 1e5 * 1e6) / 1e6;
    case 'atm': return Math.round(n * 101325 * 1e6) / 1e6;
    default: return n;
  }
}

/** "298.15", "298.15 K" → K; undefined when unreadable. */
export function readTemperature(text: string): number | undefined {
  const match = /^\s*(\d+(?:\.\d*)?(?:[eE][+-]?\d+)?)\s*K?\s*$/.exec(text);
  return match ? Number(match[1]) : undefined;
}

type FormulaReader = ReturnType<typeof formulaReader>;

/** Files repeat a few formulas many times: each distinct text is parsed once. */
function formulaReader() {
  const parsedOf = new Map<string, ReturnType<typeof tryParseFormula>>();
  const hills = new Map<ParsedFormulaOf, string>();
  return {
    parse(text: string) {
      let parsed = parsedOf.get(text);
      if (!parsed) parsedOf.set(text, (parsed = tryParseFormula(text)));
      return parsed;
    },
    hill(formula: ParsedFormulaOf) {
      let hill = hills.get(formula);
      if (hill === undefined) hills.set(formula, (hill = hillFormula(formula)));
      return hill;
    },
  };
}

/** `read` answering each text once: files repeat a few pressures and temperatures on every row. */
function remembered<T>(read: (text: string) => T): { read: (text: string) => T } {
  const answers = new Map<string, T>();
  return {
    read(text) {
      if (answers.has(text)) return answers.get(text) as T;
      const answer = read(text);
      answers.set(text, answer);
      return answer;
    },
  };
}

/** The formulas and sources the rows name, so that only those are loaded to check them. */
export function importReferences(rows: ImportRow[]): ImportReferences {
  const formulas = formulaReader();
  const hillFormulas = new Set<string>();
  const namedHillFormulas = new Set<string>();
  const names = new Set<string>();
  const sourceKeys = new Set<string>();
  const dois = new Set<string>();
  for (const { fields: f } of rows) {
    const parsed = f.formula ? formulas.parse(f.formula) : undefined;
    if (parsed?.ok) {
      const hill = formulas.hill(parsed.formula);
      if (f.name) {
        namedHillFormulas.add(hill);
        names.add(f.name);
      } else {
        hillFormulas.add(hill);
      }
    }
    if (f.sourceKey) sourceKeys.add(f.sourceKey);
    const doi = f.doi ? normalizeDoi(f.doi) : undefined;
    if (doi) dois.add(doi);
  }
  return { hillFormulas: [...hillFormulas], namedHillFormulas: [...namedHillFormulas], names: [...names], sourceKeys: [...sourceKeys], dois: [...dois], formulas };
}

/**
 * Species that the drafted items name by name rather than by id (those the import adds): the
 * catalogue must also hold every species answering to these names for the check to see clashes.
 */
export function speciesNamesIn(draft: DraftImport): string[] {
  const names = new Set<string>();
  for (const item of draft.items) if (typeof item.payload.species === 'string') names.add(item.payload.species);
  return [...names];
}

/**
 * Every row checked and made an item. `catalogue` must hold at least the species the rows'
 * formulas and names can mean (`references`), `sources` at least the sources they name. Rows in
 * parts: one `state` for all parts, each part drafted and checked before the next is drafted; a
 * part's items then hold the species and phases first needed in it, then its values.
 */
export function draftImport(rows: ImportRow[], references: ImportReferences, catalogue: CatalogueView, sources: ImportSources, state = newImportState()): DraftImport {
  const problems: ImportProblem[] = [];
  const { newSpecies, newPhases } = state;
  const speciesBefore = newSpecies.size;
  const phasesBefore = newPhases.size;
  const valueItems: DraftImport['values'] = [];
  const { formulas } = references;
  // Within one part: the catalogue phase each (formula, name, phase, polymorph) was found to be, by formula; and texts read once.
  const phasesFound = new Map<string, { name: string | undefined; phase: string; polymorph: string | null; id: string }[]>();
  const pressures = remembered(readPressure);
  const temperatures = remembered(readTemperature);

  for (const row of rows) {
    const f = row.fields;
    const before = problems.length;
    const problem = (field: string, message: string) => problems.push({ line: row.line, field, message });

    if (!f.formula) problem('formula', 'formula is required');
    const parsed = f.formula ? formulas.parse(f.formula) : undefined;
    if (parsed && !parsed.ok) problem('formula', `formula ${f.formula} cannot be read: ${parsed.error.message}`);
    const quantity = f.quantity ? QUANTITY_SPELLINGS[f.quantity.trim().toLowerCase()] ?? (['dfH', 'S', 'Cp', 'dfG', 'dtrsH'].includes(f.quantity) ? (f.quantity as Quantity) : undefined) : undefined;
    if (!f.quantity) problem('quantity', 'quantity is required (dfH, S, Cp, dfG or dtrsH)');
    else if (!quantity) problem('quantity', `quantity must be dfH, S, Cp, dfG or dtrsH (or ΔfH°, S°, Cp°, ΔfG°, ΔtrsH), got "${f.quantity}"`);
    if (!f.phase) problem('phase', `phase is required (${PHASE_CODES.join(', ')})`);
    else if (!(PHASE_CODES as readonly string[]).includes(f.phase)) problem('phase', `phase must be one of ${PHASE_CODES.join(', ')}, got "${f.phase}"`);
    const pressure = f.pressure === undefined ? undefined : pressures.read(f.pressure);
    if (f.pressure === undefined) problem('pressure', 'pressure is required: the standard pressure the value is given at (100000 Pa, 1 bar, 101325 Pa or 1 atm)');
    else if (pressure === undefined) problem('pressure', `pressure must be a number of Pa, or with kPa, bar or atm, got "${f.pressure}"`);
    const temperature = f.temperature === undefined ? 298.15 : temperatures.read(f.temperature);
    if (temperature === undefined) problem('temperature', `temperature must be a number of K, got "${f.temperature}"`);

    let sourceId: string | undefined;
    const doi = f.doi ? normalizeDoi(f.doi) : undefined;
    if (f.doi && !doi) problem('doi', `"${f.doi}" is not a DOI`);
    const byKey = f.sourceKey ? sources.byKey.get(f.sourceKey) : undefined;
    const byDoi = doi ? sources.byDoi.get(doi) : undefined;
    if (f.sourceKey && !byKey) problem('sourceKey', `no source with the key "${f.sourceKey}"; create or import it first`);
    if (doi && !byDoi) problem('doi', `no source with DOI ${doi}; create or import it first`);
    if (byKey && byDoi && byKey !== byDoi) problem('doi', `sourceKey ${f.sourceKey} and DOI ${doi} name different sources`);
    sourceId = byKey ?? byDoi;
    if (!f.sourceKey && !f.doi) problem('sourceKey', 'a source is required (sourceKey or doi): no value without a source');

    if (problems.length > before || !parsed?.ok || !quantity) continue;

    const phase = f.phase as PhaseCode;
    const polymorph = f.polymorph ?? null;
    // Files give many values of one species phase: a phase found once is found again at once.
    const sameFormula = phasesFound.get(f.formula!);
    const knownPhase = sameFormula?.find((k) => k.name === f.name && k.phase === phase && k.polymorph === polymorph)?.id;
    const found = knownPhase ? { subject: { speciesPhaseId: knownPhase }, phaseKey: knownPhase }
      : subjectOfRow(row, parsed.formula, phase, polymorph, formulas, catalogue, state);
    if ('problem' in found) {
      problems.push(found.problem);
      continue;
    }
    const { subject, phaseKey } = found;
    if (!knownPhase && 'speciesPhaseId' in subject) {
      const entry = { name: f.name, phase, polymorph, id: phaseKey };
      if (sameFormula) sameFormula.push(entry);
      else phasesFound.set(f.formula!, [entry]);
    }

    const computed = f.method === 'computed';
    // A subject is made afresh for each row, so it can become the payload.
    const payload: Record<string, unknown> = subject;
    payload.quantity = quantity;
    if (f.transition) payload.transitionKind = f.transition;
    payload.value = f.value ?? '';
    payload.unit = f.unit ?? '';
    if (f.uncertainty) payload.uncertainty = f.uncertainty;
    if (f.uncertaintyKind) payload.uncertaintyKind = f.uncertaintyKind;
    if (f.coverageFactor) payload.coverageFactor = f.coverageFactor;
    payload.temperatureK = temperature;
    payload.pressurePa = pressure;
    payload.method = f.method ?? '';
    if (computed && f.methodDetail) payload.levelOfTheory = f.methodDetail;
    if (f.sourceLocator) payload.sourceLocator = f.sourceLocator;
    const note = [f.notes, !computed && f.methodDetail ? `Method: ${f.methodDetail}` : undefined].filter(Boolean).join(' — ');
    if (note) payload.notes = note;
    valueItems.push({
      item: { id: timeOrderedId(), position: 0, kind: 'add_value', payload, sourceId: sourceId ?? null }, line: row.line,
      phaseKey, quantity, transition: f.transition ?? null, sourceId, temperature: temperature!,
    });
  }

  const ordered = [...[...newSpecies.values()].slice(speciesBefore), ...[...newPhases.values()].slice(phasesBefore), ...valueItems];
  ordered.forEach((entry, index) => {
    entry.item.position = state.nextPosition + index;
  });
  state.nextPosition += ordered.length;
  return {
    items: ordered.map((e) => e.item), lines: ordered.map((e) => e.line), values: valueItems, problems,
    counts: { species: newSpecies.size - speciesBefore, phases: newPhases.size - phasesBefore, values: valueItems.length },
  };
}

/**
 * The species phase a row is about: one in the catalogue (by id), or one the import adds (by
 * species id or name, with an add_phase item and, for a new species, an add_species item made
 * here once); or the problem why the row names none. Which species: the formula as written, else
 * the same Hill formula and charge; a name narrows them down, or adds a species.
 */
function subjectOfRow(row: ImportRow, formula: ParsedFormulaOf, phase: PhaseCode, polymorph: string | null, formulas: FormulaReader, catalogue: CatalogueView, state: ImportState):
  { subject: Record<string, unknown>; phaseKey: string } | { problem: ImportProblem } {
  const f = row.fields;
  const { newSpecies, newPhases } = state;
  const hill = formulas.hill(formula);
  const sameFormula = catalogue.speciesOfFormula(hill, formula.charge);
  const wantedName = f.name?.toLowerCase();
  const named = wantedName === undefined ? sameFormula : sameFormula.filter((s) => s.name.toLowerCase() === wantedName || s.synonyms.some((n) => n.toLowerCase() === wantedName));
  const exact = named.filter((s) => s.formula === f.formula);
  const candidates = exact.length === 1 ? exact : named;
  if (candidates.length > 1) {
    return { problem: { line: row.line, field: f.name ? 'name' : 'formula', message: `${f.formula} matches ${candidates.length} species (${candidates.map((c) => c.name).join(', ')}); give the name` } };
  }
  const withPolymorph = polymorph ? { polymorph } : {};
  if (candidates.length === 1) {
    const species = candidates[0];
    const existing = catalogue.phaseOf(species.id, phase, polymorph);
    if (existing) return { subject: { speciesPhaseId: existing.id }, phaseKey: existing.id };
    const phaseKey = `${species.id}|${phase}|${polymorph ?? ''}`;
    if (!newPhases.has(phaseKey)) {
      newPhases.set(phaseKey, { item: { id: timeOrderedId(), position: 0, kind: 'add_phase', payload: { speciesId: species.id, phase, ...withPolymorph }, sourceId: null }, line: row.line });
    }
    return { subject: { speciesId: species.id, phase, ...withPolymorph }, phaseKey };
  }
  if (!f.name) return { problem: { line: row.line, field: 'name', message: `${f.formula} (${hill}) is not in the catalogue; give its name to add it` } };
  const speciesKey = `${hill}|${formula.charge}|${f.name.toLowerCase()}`;
  if (!newSpecies.has(speciesKey)) {
    newSpecies.set(speciesKey, { item: { id: timeOrderedId(), position: 0, kind: 'add_species', payload: { formula: f.formula, name: f.name }, sourceId: null }, line: row.line });
  }
  const phaseKey = `${speciesKey}|${phase}|${polymorph ?? ''}`;
  if (!newPhases.has(phaseKey)) {
    newPhases.set(phaseKey, { item: { id: timeOrderedId(), position: 0, kind: 'add_phase', payload: { species: f.name, phase, ...withPolymorph }, sourceId: null }, line: row.line });
  }
  return { subject: { species: f.name, phase, ...withPolymorph }, phaseKey };
}

/**
 * The drafted items resolved exactly as items added by hand would be, their problems reported at
 * the rows' lines, and repeated values found. `catalogue` must also hold the species named in
 * `speciesNamesIn(draft)`.
 */
export function checkDraft(draft: DraftImport, catalogue: CatalogueView, state = newImportState()): PreparedImport {
  const problems = [...draft.problems];
  const withProblems: boolean[] = [];
  const columns: PreparedImport['columns'] = [];
  const firstPosition = draft.items[0]?.position ?? 1;
  for (const resolved of resolveItems(draft.items, catalogue, state.resolution)) {
    const index = resolved.item.position - firstPosition;
    columns[index] = itemColumns(resolved);
    for (const p of resolved.problems) {
      problems.push({ line: draft.lines[index], field: COLUMN_OF[p.field] ?? p.field, message: p.message });
      withProblems[index] = true;
    }
  }
  // Repeats among the rows that are otherwise fine.
  for (const v of draft.values) {
    if (withProblems[v.item.position - firstPosition]) continue;
    const first = firstOf(state.seen, v);
    if (first) {
      problems.push({ line: v.line, field: 'quantity', message: `line ${first.line} already gives ${v.quantity}${v.transition ? ` (${v.transition})` : ''} of this species phase from the same source at the same temperature` });
    }
  }
  problems.sort((a, b) => a.line - b.line);
  return { items: draft.items, columns, problems, counts: draft.counts };
}

/** The value `seen` already holds that `v` repeats; otherwise `v` is added and undefined answered. */
function firstOf(seen: ImportState['seen'], v: DraftValue): DraftValue | undefined {
  let atPhase = seen.get(v.phaseKey);
  if (!atPhase) seen.set(v.phaseKey, (atPhase = new Map()));
  // Mostly one value per species phase and temperature: kept as it is, a list only when there are more.
  const atTemperature = atPhase.get(v.temperature);
  if (atTemperature === undefined) {
    atPhase.set(v.temperature, v);
    return undefined;
  }
  const same = (w: DraftValue) => w.quantity === v.quantity && w.transition === v.transition && w.sourceId === v.sourceId;
  const values = Array.isArray(atTemperature) ? atTemperature : [atTemperature];
  const first = values.find(same);
  if (first) return first;
  values.push(v);
  atPhase.set(v.temperature, values);
  return undefined;
}
