import type { Request } from 'express';
import { ATOMIC_WEIGHTS, FormulaError, hillFormula, parsePhaseLabel, parseSpecies, type ParsedSpecies } from '../thermo';
import { BadRequestError } from '../shared/errors';
import { queryEnum, queryText } from '../shared/query-params';
import { QUANTITIES, type Quantity } from '../values/value-vocabulary';
import { toPhaseCode, type PhaseCode } from './phase-code';

/**
 * The filters engineers search and export by, parsed from a query string, and the SQL that
 * applies them. Every condition is written for an index: Hill formula (btree), name and synonyms
 * (trigram GIN), element symbols (GIN), and release membership (release_id, species_phase_id).
 */
export interface SpeciesFilter {
  /** free text: name or synonym (trigram-ranked), CAS RN, InChIKey, or a formula */
  q?: string;
  /** Hill formula of `q` when `q` reads as a formula */
  qHill?: string;
  /** Hill formula (with charge) from `formula` */
  hill?: string;
  elements?: string[];
  elementsMode: 'contains' | 'only';
  phase?: { phase: PhaseCode; polymorph: string | null };
  quantity?: Quantity;
}

/** Largest page of a species search. */
export const MAX_PAGE_SIZE = 100;

export const SORTS = ['name', '-name', 'formula', '-formula', 'molarMass', '-molarMass'] as const;
export type SpeciesSort = (typeof SORTS)[number];

const CAS_RN = /^[1-9][0-9]{1,6}-[0-9]{2}-[0-9]$/;
const INCHIKEY = /^[A-Z]{14}-[A-Z]{8}[SN][A-Z]-[A-Z]$/;
const MAX_Q = 200;

function formulaOrError(text: string, parameter: string): ParsedSpecies {
  try {
    return parseSpecies(text);
  } catch (error) {
    if (error instanceof FormulaError) {
      throw new BadRequestError(`${parameter} "${text}" cannot be read: ${error.reason} at column ${error.column}`, {
        parameter,
        column: error.column,
        reason: error.reason,
      });
    }
    throw error;
  }
}

/** A phase as typed (`g`, `cr, graphite`, `aq, ∞`, `aq,inf`) → the stored code and polymorph. */
export function phaseFromText(text: string, parameter = 'phase'): { phase: PhaseCode; polymorph: string | null } {
  const normalised = text.trim() === 'aq,inf' ? 'aq, ∞' : text;
  let parsed;
  try {
    parsed = parsePhaseLabel(normalised);
  } catch (error) {
    if (error instanceof FormulaError) throw new BadRequestError(`${parameter}: ${error.reason}`, { parameter, reason: error.reason });
    throw error;
  }
  const code = toPhaseCode(parsed);
  if (!code) throw new BadRequestError(`${parameter}: the catalogue keeps no data for phase '${parsed.state}' (use g, l, cr, am, aq or aq,inf)`, { parameter });
  return code;
}

/** Reads the search filters of a request; a malformed one is a 400 naming it. */
export function speciesFilterFromQuery(req: Request): SpeciesFilter {
  const filter: SpeciesFilter = { elementsMode: queryEnum(req, 'elementsMode', ['contains', 'only'] as const) ?? 'contains' };
  const q = queryText(req, 'q')?.trim();
  if (q) {
    if (q.length > MAX_Q) throw new BadRequestError(`q must be at most ${MAX_Q} characters`, { parameter: 'q' });
    filter.q = q;
    try {
      filter.qHill = hillFormula(parseSpecies(q).formula);
    } catch (error) {
      if (!(error instanceof FormulaError)) throw error;
    }
  }
  const formula = queryText(req, 'formula');
  let formulaPhase: SpeciesFilter['phase'];
  if (formula !== undefined) {
    const parsed = formulaOrError(formula, 'formula');
    filter.hill = hillFormula(parsed.formula);
    if (parsed.phase) {
      formulaPhase = toPhaseCode(parsed.phase);
      if (!formulaPhase) throw new BadRequestError(`formula: the catalogue keeps no data for phase '${parsed.phase.state}'`, { parameter: 'formula' });
    }
  }
  const elements = queryText(req, 'elements');
  if (elements !== undefined) {
    const symbols = [...new Set(elements.split(',').map((s) => s.trim()).filter(Boolean))];
    const unknown = symbols.filter((s) => !ATOMIC_WEIGHTS.has(s));
    if (symbols.length === 0 || unknown.length > 0) {
      throw new BadRequestError(`elements must be element symbols separated by commas (e.g. C,H,O)${unknown.length ? `; unknown: ${unknown.join(', ')}` : ''}`, {
        parameter: 'elements',
        unknown,
      });
    }
    filter.elements = symbols.sort();
  }
  const phase = queryText(req, 'phase');
  if (phase !== undefined) filter.phase = phaseFromText(phase);
  if (formulaPhase) {
    if (filter.phase && (filter.phase.phase !== formulaPhase.phase || filter.phase.polymorph !== formulaPhase.polymorph)) {
      throw new BadRequestError('phase and the phase written in formula disagree', { parameter: 'phase' });
    }
    filter.phase = formulaPhase;
  }
  filter.quantity = queryEnum(req, 'quantity', QUANTITIES);
  return filter;
}

/** Escapes LIKE wildcards so that a search for "50%" means the characters. */
function likePattern(text: string): string {
  return `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

/** Appends `value` to the query's parameters; returns its placeholder (`$n`). */
function placeholder(params: unknown[], value: unknown): string {
  return `$${params.push(value)}`;
}

/** SQL conditions on `species s` with positional parameters appended to `params`. */
export interface SpeciesConditions {
  where: string;
  /** relevance of a row to `q` (higher is better), or null without `q` */
  rank: string | null;
}

/**
 * The WHERE clause for species matching `filter` that hold data in release `$releaseParam`
 * (with the phase and quantity asked for, when asked).
 */
export function speciesConditions(filter: SpeciesFilter, params: unknown[], releaseParam: string): SpeciesConditions {
  const { conditions, rank } = speciesMatch(filter, params);
  conditions.push(releaseMembership(filter, params, releaseParam));
  return { where: conditions.join(' AND '), rank };
}

/**
 * The conditions on `species s` itself (text, formula, elements), without release membership:
 * for a query that joins the release's members itself and puts the phase and quantity on them.
 */
export function speciesMatch(filter: SpeciesFilter, params: unknown[]): { conditions: string[]; rank: string | null } {
  const p = (value: unknown) => placeholder(params, value);
  const conditions: string[] = [];
  let rank: string | null = null;
  if (filter.q !== undefined) {
    const q = p(filter.q);
    const like = p(likePattern(filter.q));
    const synonyms = 'kx_text_array_to_text(s.synonyms)';
    const matches = [`s.name ILIKE ${like}`, `${q} <% s.name`, `${synonyms} ILIKE ${like}`, `${q} <% ${synonyms}`];
    const boosts = [
      `CASE WHEN lower(s.name) = lower(${q}) THEN 2 ELSE 0 END`,
      `CASE WHEN lower(${q}) = ANY (SELECT lower(x) FROM unnest(s.synonyms) x) THEN 1.8 ELSE 0 END`,
      `similarity(s.name, ${q})`,
      `word_similarity(${q}, s.name)`,
      `0.9 * word_similarity(${q}, ${synonyms})`,
    ];
    if (CAS_RN.test(filter.q)) {
      matches.push(`s.cas_rn = ${q}`);
      boosts.push(`CASE WHEN s.cas_rn = ${q} THEN 3 ELSE 0 END`);
    }
    if (INCHIKEY.test(filter.q.toUpperCase())) {
      const key = p(filter.q.toUpperCase());
      matches.push(`s.inchikey = ${key}`);
      boosts.push(`CASE WHEN s.inchikey = ${key} THEN 3 ELSE 0 END`);
    }
    if (filter.qHill) {
      const hill = p(filter.qHill);
      matches.push(`s.hill_formula = ${hill}`);
      boosts.push(`CASE WHEN s.hill_formula = ${hill} THEN 1.5 ELSE 0 END`);
    }
    conditions.push(`(${matches.join(' OR ')})`);
    rank = `GREATEST(${boosts.join(', ')})`;
  }
  if (filter.hill !== undefined) conditions.push(`s.hill_formula = ${p(filter.hill)}`);
  if (filter.elements) {
    const symbols = `${p(filter.elements)}::text[]`;
    conditions.push(filter.elementsMode === 'only'
      ? `s.element_symbols <@ ${symbols} AND cardinality(s.element_symbols) > 0`
      : `s.element_symbols @> ${symbols}`);
  }
  return { conditions, rank };
}

/** EXISTS: species `s` holds data in release `releaseParam`, with the phase and quantity asked for. */
export function releaseMembership(filter: SpeciesFilter, params: unknown[], releaseParam: string): string {
  const p = (value: unknown) => placeholder(params, value);
  const member = [`sp.species_id = s.id`, `m.release_id = ${releaseParam}`];
  if (filter.phase) {
    member.push(`sp.phase = ${p(filter.phase.phase)}`);
    if (filter.phase.polymorph !== null) member.push(`sp.polymorph = ${p(filter.phase.polymorph)}`);
  }
  if (filter.quantity) member.push(`m.quantity = ${p(filter.quantity)}`);
  return `EXISTS (SELECT 1 FROM species_phases sp JOIN release_members m ON m.species_phase_id = sp.id WHERE ${member.join(' AND ')})`;
}

/**
 * ORDER BY for a sort parameter; relevance first when searching by text without a sort. The name
 * and molar-mass orders match the indexes (lower(name), id) and (molar_mass, id), so a page is an
 * index range scan.
 */
export function speciesOrder(sort: SpeciesSort | undefined, rank: string | null): string {
  switch (sort) {
    case 'name':
      return 'lower(s.name), s.id';
    case '-name':
      return 'lower(s.name) DESC, s.id DESC';
    case 'formula':
      return 's.hill_formula, lower(s.name), s.id';
    case '-formula':
      return 's.hill_formula DESC, lower(s.name), s.id';
    case 'molarMass':
      return 's.molar_mass, s.id';
    case '-molarMass':
      return 's.molar_mass DESC, s.id DESC';
    default:
      return rank ? `${rank} DESC, lower(s.name), s.id` : 'lower(s.name), s.id';
  }
}
