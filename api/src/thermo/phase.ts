import { FormulaError } from './errors';

/**
 * States of aggregation in IUPAC Green Book abbreviations: g gas, l liquid, cr crystalline,
 * am amorphous, aq aqueous solution, s solid (unspecified), vit vitreous, sln solution,
 * lc liquid crystal.
 */
export type PhaseState = 'g' | 'l' | 'cr' | 'am' | 'aq' | 's' | 'vit' | 'sln' | 'lc';

/** A phase as stored with a species: `(cr, graphite)`, `(aq, ∞)`, `(g)`. */
export interface Phase {
  readonly state: PhaseState;
  /** polymorph or modification of a crystal, e.g. "graphite", "rhombic", "I" */
  readonly modification?: string;
  /** aqueous at infinite dilution, written `aq, ∞` */
  readonly infiniteDilution?: boolean;
}

const STATES: ReadonlySet<string> = new Set<PhaseState>(['g', 'l', 'cr', 'am', 'aq', 's', 'vit', 'sln', 'lc']);
const INFINITY_WORDS: ReadonlySet<string> = new Set(['∞', 'inf', 'infinity', 'infinite dilution']);

/**
 * Reads the inside of a phase label: "g", "cr, graphite", "aq, ∞" (also "aq,inf").
 * @param label  text between the parentheses
 * @param source whole text, for the error
 * @param column 0-based column of `label` in `source`
 * @throws FormulaError naming the column and why the label is not accepted
 */
export function parsePhaseLabel(label: string, source: string = label, column = 0): Phase {
  const comma = label.indexOf(',');
  const stateText = (comma < 0 ? label : label.slice(0, comma)).trim();
  const detail = comma < 0 ? null : label.slice(comma + 1).trim();
  const stateColumn = column + label.indexOf(stateText);

  if (stateText === 'ao' || stateText === 'ai') {
    throw new FormulaError(source, stateColumn,
      `'${stateText}' is an NBS-table label for a solute's standard state; use (aq) or (aq, ∞)`);
  }
  if (!STATES.has(stateText)) {
    throw new FormulaError(source, stateColumn,
      `unknown phase '${stateText}' (use g, l, cr, am, aq, s, vit, sln or lc)`);
  }
  const state = stateText as PhaseState;
  if (detail === null) return { state };
  const detailColumn = column + comma + 1 + (label.slice(comma + 1).length - label.slice(comma + 1).trimStart().length);
  if (detail === '') throw new FormulaError(source, detailColumn, `empty detail after '${state},'`);
  if (state === 'aq') {
    if (INFINITY_WORDS.has(detail.toLowerCase())) return { state, infiniteDilution: true };
    throw new FormulaError(source, detailColumn, `'aq' takes only '∞' (infinite dilution), not '${detail}'`);
  }
  if (state === 'cr' || state === 's' || state === 'am' || state === 'l') {
    if (!/^[\p{L}\p{N}][\p{L}\p{N} '\-]*$/u.test(detail)) {
      throw new FormulaError(source, detailColumn, `modification '${detail}' must be a name such as graphite or rhombic`);
    }
    return { state, modification: detail };
  }
  throw new FormulaError(source, detailColumn, `'${state}' takes no modification`);
}

/** Phase label with its parentheses, IUPAC style: "(cr, graphite)", "(aq, ∞)", "(g)". */
export function formatPhase(phase: Phase): string {
  if (phase.infiniteDilution) return `(${phase.state}, ∞)`;
  if (phase.modification) return `(${phase.state}, ${phase.modification})`;
  return `(${phase.state})`;
}

/** True when two phases are the same state and modification. */
export function samePhase(a: Phase | null, b: Phase | null): boolean {
  if (a === null || b === null) return a === b;
  return a.state === b.state && (a.modification ?? '') === (b.modification ?? '') &&
    Boolean(a.infiniteDilution) === Boolean(b.infiniteDilution);
}
