import { tryParseFormula } from '../thermo/formula';
import { isInchiKeyFormat, isValidCasRn } from '../species/identifiers';
import { PHASE_CODES, PHASES_WITH_POLYMORPH, type PhaseCode } from '../species/phase-code';
import { fitRangeProblems } from '../values/fit-ranges';
import { FIT_FORMS, METHODS, QUANTITIES, STANDARD_PRESSURES, TRANSITION_KINDS, type FitForm, type Quantity, type TransitionKind } from '../values/value-vocabulary';
import type { ProposalItemKind } from './proposal-vocabulary';
import { readEnteredValue, type EnteredValue, type EntryProblem } from './value-entry';

/**
 * The payload of each kind of proposal item (JSON object; numbers as typed, with their unit):
 *
 * - `add_species`: `{formula, name, synonyms?, casRn?, inchi?, inchikey?, smiles?, notes?}`
 * - `add_phase`: `{speciesId | species, phase, polymorph?, isReferenceState?, notes?}` — `species`
 *   names (or gives the formula of) a species in the catalogue or one added earlier in the proposal
 * - `add_value`: `{speciesPhaseId | (speciesId | species) + phase + polymorph?, quantity,
 *   transitionKind? (ΔtrsH only), transitionLabel?, value, unit, uncertainty?, uncertaintyKind?,
 *   coverageFactor?, temperatureK? (298.15), pressurePa (100000 or 101325), method,
 *   levelOfTheory? (computed), sourceLocator?, notes?}`
 * - `revise_value`: `{valueId, value, unit, uncertainty?, …}`: the numbers of the new version; the
 *   subject (species phase, quantity) is the revised value's
 * - `retire_value`: `{valueId, reason}`
 * - `add_fit`: `{subject as add_value, form, tMin, tMax, ranges, pressurePa?, method, levelOfTheory?, sourceLocator?, notes?}`
 * - `replace_fit`: `{fitId, form, tMin, tMax, ranges, …}`
 * - `recommend`: `{valueId | fitId, note?}`: asks the editor to make this the recommended member of
 *   its species phase and quantity in the release the proposal goes into
 *
 * Every item except add_species, add_phase, retire_value and recommend needs `sourceId`.
 */

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
const MAX_TEXT = 2000;

const VALUE_FIELDS = ['value', 'unit', 'uncertainty', 'uncertaintyKind', 'coverageFactor', 'temperatureK', 'pressurePa', 'method', 'levelOfTheory', 'sourceLocator', 'notes'];
const SUBJECT_FIELDS = ['speciesPhaseId', 'speciesId', 'species', 'phase', 'polymorph'];
const FIT_FIELDS = ['form', 'tMin', 'tMax', 'ranges', 'pressurePa', 'method', 'levelOfTheory', 'sourceLocator', 'notes'];

const ALLOWED: Readonly<Record<ProposalItemKind, readonly string[]>> = {
  add_species: ['formula', 'name', 'synonyms', 'casRn', 'inchi', 'inchikey', 'smiles', 'notes'],
  add_phase: ['speciesId', 'species', 'phase', 'polymorph', 'isReferenceState', 'notes'],
  add_value: [...SUBJECT_FIELDS, 'quantity', 'transitionKind', 'transitionLabel', ...VALUE_FIELDS],
  revise_value: ['valueId', ...VALUE_FIELDS],
  retire_value: ['valueId', 'reason'],
  add_fit: [...SUBJECT_FIELDS, ...FIT_FIELDS],
  replace_fit: ['fitId', ...FIT_FIELDS],
  recommend: ['valueId', 'fitId', 'note'],
};

/** Kinds that create data and so need a source (matches proposal_items_source_required). */
export const KINDS_NEEDING_SOURCE: readonly ProposalItemKind[] = ['add_value', 'revise_value', 'add_fit', 'replace_fit'];

/** What an item refers to, read from its payload (ids are checked against the database later). */
export interface PayloadReferences {
  speciesId?: string;
  speciesPhaseId?: string;
  /** a species named in the payload (catalogue or an add_species item of the same proposal) */
  speciesName?: string;
  phase?: PhaseCode;
  polymorph?: string | null;
  targetValueId?: string;
  targetFitId?: string;
}

export interface PayloadCheck {
  problems: EntryProblem[];
  refs: PayloadReferences;
}

type Payload = Record<string, unknown>;

const present = (x: unknown) => x !== undefined && x !== null && x !== '';

function text(p: Payload, key: string, problems: EntryProblem[], options: { required?: boolean; max?: number } = {}): string | undefined {
  const v = p[key];
  if (!present(v)) {
    if (options.required) problems.push({ field: `payload.${key}`, message: `${key} is required` });
    return undefined;
  }
  if (typeof v !== 'string' || v.trim().length === 0) {
    problems.push({ field: `payload.${key}`, message: `${key} must be text` });
    return undefined;
  }
  if (v.length > (options.max ?? MAX_TEXT)) {
    problems.push({ field: `payload.${key}`, message: `${key} must be at most ${options.max ?? MAX_TEXT} characters` });
    return undefined;
  }
  return v.trim();
}

function id(p: Payload, key: string, problems: EntryProblem[], required = false): string | undefined {
  const v = p[key];
  if (!present(v)) {
    if (required) problems.push({ field: `payload.${key}`, message: `${key} is required` });
    return undefined;
  }
  if (typeof v !== 'string' || !UUID.test(v)) {
    problems.push({ field: `payload.${key}`, message: `${key} must be a UUID` });
    return undefined;
  }
  return v.toLowerCase();
}

function oneOf<T extends string>(p: Payload, key: string, allowed: readonly T[], problems: EntryProblem[], required = true): T | undefined {
  const v = p[key];
  if (!present(v)) {
    if (required) problems.push({ field: `payload.${key}`, message: `${key} is required (one of ${allowed.join(', ')})` });
    return undefined;
  }
  if (typeof v !== 'string' || !allowed.includes(v as T)) {
    problems.push({ field: `payload.${key}`, message: `${key} must be one of ${allowed.join(', ')} (got ${JSON.stringify(v)})` });
    return undefined;
  }
  return v as T;
}

function finite(p: Payload, key: string, problems: EntryProblem[], required: boolean): number | undefined {
  const v = p[key];
  if (!present(v)) {
    if (required) problems.push({ field: `payload.${key}`, message: `${key} is required` });
    return undefined;
  }
  const n = typeof v === 'number' ? v : typeof v === 'string' ? Number(v) : Number.NaN;
  if (!Number.isFinite(n)) {
    problems.push({ field: `payload.${key}`, message: `${key} must be a number (got ${JSON.stringify(v)})` });
    return undefined;
  }
  return n;
}

/**
 * Checks the form of an item's payload for its kind and reads the references it makes.
 * `target` is the value a revise_value item revises (its quantity decides the accepted units);
 * without it only the form of the numbers is checked.
 */
export function checkItemPayload(kind: ProposalItemKind, payload: unknown, sourceId: string | null, target?: { quantity: Quantity; transitionKind?: TransitionKind | null }): PayloadCheck {
  const problems: EntryProblem[] = [];
  const refs: PayloadReferences = {};
  if (typeof payload !== 'object' || payload === null || Array.isArray(payload)) {
    return { problems: [{ field: 'payload', message: 'payload must be an object' }], refs };
  }
  const p = payload as Payload;
  for (const key of Object.keys(p)) {
    if (!ALLOWED[kind].includes(key)) problems.push({ field: `payload.${key}`, message: `${key} is not a field of a ${kind} item (allowed: ${ALLOWED[kind].join(', ')})` });
  }
  if (KINDS_NEEDING_SOURCE.includes(kind) && !sourceId) {
    problems.push({ field: 'sourceId', message: 'a source is required: no value without a source' });
  }
  switch (kind) {
    case 'add_species':
      checkSpecies(p, problems);
      break;
    case 'add_phase':
      readSubject(p, problems, refs, false);
      if (p.isReferenceState !== undefined && typeof p.isReferenceState !== 'boolean') {
        problems.push({ field: 'payload.isReferenceState', message: 'isReferenceState must be true or false' });
      }
      text(p, 'notes', problems);
      break;
    case 'add_value': {
      readSubject(p, problems, refs, true);
      const quantity = oneOf(p, 'quantity', QUANTITIES, problems);
      const transition = oneOf(p, 'transitionKind', TRANSITION_KINDS, problems, false);
      if (quantity === 'dtrsH' && !transition) problems.push({ field: 'payload.transitionKind', message: `a transition enthalpy needs transitionKind (${TRANSITION_KINDS.join(', ')})` });
      if (quantity && quantity !== 'dtrsH' && transition) problems.push({ field: 'payload.transitionKind', message: 'transitionKind belongs to ΔtrsH values only' });
      if (quantity !== 'dtrsH' && present(p.transitionLabel)) problems.push({ field: 'payload.transitionLabel', message: 'transitionLabel belongs to ΔtrsH values only' });
      text(p, 'transitionLabel', problems, { max: 200 });
      checkNumbers(p, quantity, problems, transition);
      break;
    }
    case 'revise_value':
      refs.targetValueId = id(p, 'valueId', problems, true);
      checkNumbers(p, target?.quantity, problems, target?.transitionKind ?? undefined);
      break;
    case 'retire_value':
      refs.targetValueId = id(p, 'valueId', problems, true);
      text(p, 'reason', problems, { required: true });
      break;
    case 'add_fit':
      readSubject(p, problems, refs, true);
      checkFit(p, problems);
      break;
    case 'replace_fit':
      refs.targetFitId = id(p, 'fitId', problems, true);
      checkFit(p, problems);
      break;
    case 'recommend': {
      const valueId = id(p, 'valueId', problems);
      const fitId = id(p, 'fitId', problems);
      if (!valueId === !fitId && !problems.some((x) => x.field === 'payload.valueId' || x.field === 'payload.fitId')) {
        problems.push({ field: 'payload.valueId', message: 'give exactly one of valueId and fitId' });
      }
      refs.targetValueId = valueId;
      refs.targetFitId = fitId;
      text(p, 'note', problems);
      break;
    }
  }
  return { problems, refs };
}

function checkSpecies(p: Payload, problems: EntryProblem[]): void {
  const formula = text(p, 'formula', problems, { required: true, max: 200 });
  if (formula) {
    const parsed = tryParseFormula(formula);
    if (!parsed.ok) problems.push({ field: 'payload.formula', message: `formula cannot be read: ${parsed.error.message}` });
  }
  text(p, 'name', problems, { required: true, max: 300 });
  if (p.synonyms !== undefined && (!Array.isArray(p.synonyms) || !p.synonyms.every((s) => typeof s === 'string' && s.trim().length > 0 && s.length <= 300))) {
    problems.push({ field: 'payload.synonyms', message: 'synonyms must be a list of names' });
  }
  const cas = text(p, 'casRn', problems, { max: 20 });
  if (cas && !isValidCasRn(cas)) problems.push({ field: 'payload.casRn', message: `casRn ${cas} is not a valid CAS Registry Number (form or check digit)` });
  const inchikey = text(p, 'inchikey', problems, { max: 27 });
  if (inchikey && !isInchiKeyFormat(inchikey)) problems.push({ field: 'payload.inchikey', message: 'inchikey must be a standard 27-character InChIKey' });
  const inchi = text(p, 'inchi', problems, { max: MAX_TEXT });
  if (inchi && !/^InChI=1S?\//.test(inchi)) problems.push({ field: 'payload.inchi', message: 'inchi must start with InChI=1S/ or InChI=1/' });
  text(p, 'smiles', problems, { max: MAX_TEXT });
  text(p, 'notes', problems);
}

function readSubject(p: Payload, problems: EntryProblem[], refs: PayloadReferences, phaseSubject: boolean): void {
  const speciesPhaseId = phaseSubject ? id(p, 'speciesPhaseId', problems) : undefined;
  const speciesId = id(p, 'speciesId', problems);
  const species = text(p, 'species', problems, { max: 300 });
  const phase = oneOf(p, 'phase', PHASE_CODES, problems, false);
  const polymorph = text(p, 'polymorph', problems, { max: 100 });
  if (speciesPhaseId) {
    if (speciesId || species || phase || polymorph) problems.push({ field: 'payload.speciesPhaseId', message: 'give either speciesPhaseId, or a species with its phase, not both' });
    refs.speciesPhaseId = speciesPhaseId;
    return;
  }
  if (!speciesId && !species && !problems.some((x) => x.field === 'payload.speciesId' || x.field === 'payload.species')) {
    problems.push({ field: phaseSubject ? 'payload.speciesPhaseId' : 'payload.species', message: phaseSubject ? 'name the species phase: speciesPhaseId, or speciesId (or species) with phase' : 'name the species: speciesId or species' });
  }
  if (speciesId && species) problems.push({ field: 'payload.species', message: 'give speciesId or species, not both' });
  if (!phase && !problems.some((x) => x.field === 'payload.phase')) problems.push({ field: 'payload.phase', message: `phase is required (one of ${PHASE_CODES.join(', ')})` });
  if (phase && polymorph && !PHASES_WITH_POLYMORPH.has(phase)) problems.push({ field: 'payload.polymorph', message: `a polymorph label belongs to ${[...PHASES_WITH_POLYMORPH].join(', ')} phases only` });
  refs.speciesId = speciesId;
  refs.speciesName = species;
  refs.phase = phase;
  refs.polymorph = polymorph ?? null;
}

function checkNumbers(p: Payload, quantity: Quantity | undefined, problems: EntryProblem[], transition?: TransitionKind): void {
  if (quantity) {
    const read = readEnteredValue(quantity, p);
    if (!read.ok) problems.push(...read.problems.map((x) => ({ field: `payload.${x.field}`, message: x.message })));
    // Rules the database enforces (thermo_values_entropy_positive, …), named here first.
    else if ((quantity === 'S' || quantity === 'Cp') && !(read.entry.valueSi > 0)) {
      problems.push({ field: 'payload.value', message: `${quantity === 'S' ? 'a third-law entropy S°' : 'a heat capacity Cp°'} must be positive (got ${read.entry.enteredValue})` });
    } else if (quantity === 'dtrsH' && transition && transition !== 'trs' && !(read.entry.valueSi > 0)) {
      problems.push({ field: 'payload.value', message: `an enthalpy of ${transition === 'fus' ? 'fusion' : transition === 'vap' ? 'vaporisation' : 'sublimation'} must be positive (got ${read.entry.enteredValue})` });
    }
  } else if (!present(p.value)) {
    problems.push({ field: 'payload.value', message: 'value is required' });
  }
  const t = finite(p, 'temperatureK', problems, false);
  if (t !== undefined && !(t > 0)) problems.push({ field: 'payload.temperatureK', message: 'temperatureK must be above 0 K' });
  checkPressure(p, problems, true);
  const method = oneOf(p, 'method', METHODS, problems);
  if (method === 'computed') text(p, 'levelOfTheory', problems, { required: true, max: 500 });
  else text(p, 'levelOfTheory', problems, { max: 500 });
  text(p, 'sourceLocator', problems, { max: 500 });
  text(p, 'notes', problems);
}

function checkPressure(p: Payload, problems: EntryProblem[], required: boolean): void {
  const pressure = finite(p, 'pressurePa', problems, required);
  if (pressure !== undefined && !(STANDARD_PRESSURES as readonly number[]).includes(pressure)) {
    problems.push({ field: 'payload.pressurePa', message: `the standard pressure must be 100000 Pa (1 bar) or 101325 Pa (1 atm) (got ${pressure})` });
  }
}

function checkFit(p: Payload, problems: EntryProblem[]): void {
  const form = oneOf(p, 'form', FIT_FORMS, problems);
  const tMin = finite(p, 'tMin', problems, true);
  const tMax = finite(p, 'tMax', problems, true);
  if (form && tMin !== undefined && tMax !== undefined) {
    for (const message of fitRangeProblems(form, tMin, tMax, p.ranges)) problems.push({ field: 'payload.ranges', message });
  }
  checkPressure(p, problems, false);
  const method = oneOf(p, 'method', METHODS, problems);
  if (method === 'computed') text(p, 'levelOfTheory', problems, { required: true, max: 500 });
  else text(p, 'levelOfTheory', problems, { max: 500 });
  text(p, 'sourceLocator', problems, { max: 500 });
  text(p, 'notes', problems);
}

/** A trimmed text field of a payload, or null when absent or blank. */
function optionalText(payload: Payload, key: string): string | null {
  const v = payload[key];
  return typeof v === 'string' && v.trim() ? v.trim() : null;
}

/** The columns of a value version read from a valid value payload (add_value or revise_value). */
export interface ValueColumns {
  entry: EnteredValue;
  temperatureK: number;
  pressurePa: number;
  method: (typeof METHODS)[number];
  levelOfTheory: string | null;
  sourceLocator: string | null;
  notes: string | null;
  transitionKind: TransitionKind | null;
  transitionLabel: string | null;
}

/** Reads a payload already checked by checkItemPayload into value columns (SI). */
export function valueColumns(payload: Payload, quantity: Quantity): ValueColumns {
  const read = readEnteredValue(quantity, payload);
  if (!read.ok) throw new Error(`value payload not checked: ${read.problems.map((p) => p.message).join('; ')}`);
  const str = (k: string) => optionalText(payload, k);
  return {
    entry: read.entry,
    temperatureK: present(payload.temperatureK) ? Number(payload.temperatureK) : 298.15,
    pressurePa: Number(payload.pressurePa),
    method: payload.method as ValueColumns['method'],
    levelOfTheory: str('levelOfTheory'),
    sourceLocator: str('sourceLocator'),
    notes: str('notes'),
    transitionKind: (payload.transitionKind as TransitionKind | undefined) ?? null,
    transitionLabel: str('transitionLabel'),
  };
}

/** The columns of a fit version read from a valid fit payload. */
export function fitColumns(payload: Payload): { form: FitForm; tMinK: number; tMaxK: number; ranges: unknown; pressurePa: number; method: ValueColumns['method']; levelOfTheory: string | null; sourceLocator: string | null; notes: string | null } {
  const str = (k: string) => optionalText(payload, k);
  return {
    form: payload.form as FitForm,
    tMinK: Number(payload.tMin),
    tMaxK: Number(payload.tMax),
    ranges: payload.ranges,
    pressurePa: present(payload.pressurePa) ? Number(payload.pressurePa) : 100000,
    method: payload.method as ValueColumns['method'],
    levelOfTheory: str('levelOfTheory'),
    sourceLocator: str('sourceLocator'),
    notes: str('notes'),
  };
}
