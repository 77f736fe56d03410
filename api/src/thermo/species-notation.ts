import { FormulaError } from './errors';
import { parseFormula, type ParsedFormula } from './formula';
import { formatPhase, parsePhaseLabel, type Phase } from './phase';

/** A species as typed: its formula and, optionally, its phase. */
export interface ParsedSpecies {
  readonly formula: ParsedFormula;
  readonly phase: Phase | null;
  /** the formula text as typed (trimmed, phase removed) */
  readonly formulaText: string;
  /** normalised label: formula text + IUPAC phase label, e.g. "C(cr, graphite)" */
  readonly label: string;
}

/**
 * Parses a species label: a formula followed by an optional phase in parentheses,
 * `H2O(l)`, `C(cr, graphite)`, `SO4^2-(aq)`, `H+(aq, ∞)`, `O2 (g)`. A trailing parenthesised
 * group is a phase when its text starts with a lowercase letter (element symbols start with a
 * capital, so `Ca(OH)2` is never misread).
 *
 * @param text   the species text
 * @param offset column of `text` inside a larger input (an equation), for error positions
 * @throws FormulaError with the column (in the larger input when `offset` is given)
 */
export function parseSpecies(text: string, offset = 0, source?: string): ParsedSpecies {
  const whole = source ?? text;
  let end = text.length;
  while (end > 0 && /\s/.test(text[end - 1])) end--;
  let start = 0;
  while (start < end && /\s/.test(text[start])) start++;

  let phase: Phase | null = null;
  let formulaEnd = end;
  if (end > start && text[end - 1] === ')') {
    const open = text.lastIndexOf('(', end - 1);
    const inside = open >= 0 ? text.slice(open + 1, end - 1) : '';
    if (open >= start && /^\s*\p{Ll}/u.test(inside) && !inside.includes(')')) {
      if (open === start) throw new FormulaError(whole, offset + open, 'a phase needs a formula before it');
      phase = parsePhaseLabel(inside, whole, offset + open + 1);
      formulaEnd = open;
      while (formulaEnd > start && /\s/.test(text[formulaEnd - 1])) formulaEnd--;
    }
  }
  const formulaText = text.slice(start, formulaEnd);
  let formula: ParsedFormula;
  try {
    formula = parseFormula(formulaText);
  } catch (error) {
    if (error instanceof FormulaError) throw new FormulaError(whole, offset + start + error.column, error.reason);
    throw error;
  }
  return { formula, phase, formulaText, label: formulaText + (phase ? formatPhase(phase) : '') };
}
