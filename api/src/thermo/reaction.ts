import { FormulaError, ReactionError } from './errors';
import { Rational } from './rational';
import { parseSpecies, type ParsedSpecies } from './species-notation';

/** `->`, `→`, `⟶`, `=>`, `=` read as 'forward'; `<=>`, `<->`, `⇌`, `⇄` as 'equilibrium'. */
export type ArrowKind = 'forward' | 'equilibrium';

/** One term of an equation: an optional coefficient and a species. */
export interface ReactionTerm {
  /** the stoichiometric coefficient as written (exact), or null when none was written */
  readonly coefficient: Rational | null;
  readonly species: ParsedSpecies;
  /** 0-based column where the term starts in the equation */
  readonly column: number;
}

/** A parsed reaction equation. */
export interface ParsedReaction {
  readonly input: string;
  readonly reactants: readonly ReactionTerm[];
  readonly products: readonly ReactionTerm[];
  readonly arrow: ArrowKind;
}

const ARROWS: ReadonlyArray<readonly [text: string, kind: ArrowKind]> = [
  ['<=>', 'equilibrium'], ['<->', 'equilibrium'], ['⇌', 'equilibrium'], ['⇄', 'equilibrium'],
  ['->', 'forward'], ['→', 'forward'], ['⟶', 'forward'], ['=>', 'forward'], ['=', 'forward'],
];

const UNICODE_FRACTIONS: Readonly<Record<string, Rational>> = {
  '½': Rational.of(1, 2), '⅓': Rational.of(1, 3), '⅔': Rational.of(2, 3),
  '¼': Rational.of(1, 4), '¾': Rational.of(3, 4),
};

interface ArrowMatch {
  readonly start: number;
  readonly end: number;
  readonly kind: ArrowKind;
}

function findArrows(text: string): ArrowMatch[] {
  const found: ArrowMatch[] = [];
  let i = 0;
  while (i < text.length) {
    const hit = ARROWS.find(([arrow]) => text.startsWith(arrow, i));
    // A '-' before '->' may be a charge (SO4-- -> …) only when separated by a space, so
    // "->" is taken as written; "=" inside "<=>" is consumed with it.
    if (hit) {
      found.push({ start: i, end: i + hit[0].length, kind: hit[1] });
      i += hit[0].length;
    } else {
      i++;
    }
  }
  return found;
}

function isSpace(ch: string | undefined): boolean {
  return ch === ' ' || ch === '\t' || ch === '\n' || ch === '\r';
}

/**
 * Decides whether a '+' at `i` (not preceded by whitespace) is part of a charge. It is when
 * followed by the end of the side, whitespace, another sign, a parenthesis (phase), or
 * digits that themselves end the species (Fe+3, Fe+3(aq)).
 */
function plusIsCharge(side: string, i: number): boolean {
  let j = i + 1;
  const next = side[j];
  if (next === undefined || isSpace(next) || next === '+' || next === '-' || next === '(' || next === '−') return true;
  if (!/[0-9]/.test(next)) return false;
  while (j < side.length && /[0-9]/.test(side[j])) j++;
  return j === side.length || isSpace(side[j]) || side[j] === '(' || side[j] === '+';
}

/** Splits one side of an equation into term texts with their columns. */
function splitSide(input: string, from: number, to: number): Array<{ text: string; column: number }> {
  const side = input.slice(from, to);
  const terms: Array<{ text: string; column: number }> = [];
  let depth = 0;
  let start = 0;
  for (let i = 0; i < side.length; i++) {
    const ch = side[i];
    if (ch === '(' || ch === '[') depth++;
    else if (ch === ')' || ch === ']') depth = Math.max(0, depth - 1);
    else if (ch === '+' && depth === 0) {
      const attached = i > 0 && !isSpace(side[i - 1]) && side.slice(start, i).trim() !== '';
      if (attached && plusIsCharge(side, i)) continue;
      terms.push({ text: side.slice(start, i), column: from + start });
      start = i + 1;
    }
  }
  terms.push({ text: side.slice(start), column: from + start });
  return terms;
}

function parseTerm(input: string, text: string, column: number, sideName: string): ReactionTerm {
  let i = 0;
  while (i < text.length && isSpace(text[i])) i++;
  if (i === text.length) {
    throw new ReactionError(input, column + i, `missing species ${sideName === 'left' ? 'before' : 'after'} '+'`);
  }
  const termColumn = column + i;
  let coefficient: Rational | null = null;
  const rest = text.slice(i);
  const numeric = /^(\d+\/\d+|\d*\.\d+|\d+)/.exec(rest);
  if (numeric) {
    coefficient = Rational.parse(numeric[1]);
    if (coefficient === null) throw new ReactionError(input, termColumn, `'${numeric[1]}' is not a valid coefficient`);
    i += numeric[1].length;
  } else if (rest[0] in UNICODE_FRACTIONS) {
    coefficient = UNICODE_FRACTIONS[rest[0]];
    i += 1;
  } else if (rest[0] === '-' || rest[0] === '−') {
    throw new ReactionError(input, termColumn, 'a coefficient cannot be negative (move the species to the other side)');
  }
  if (coefficient !== null && coefficient.isZero()) {
    throw new ReactionError(input, termColumn, 'a coefficient of zero (leave the species out)');
  }
  while (i < text.length && isSpace(text[i])) i++;
  if (i === text.length) throw new ReactionError(input, termColumn, 'a coefficient without a species');
  try {
    const species = parseSpecies(text.slice(i), column + i, input);
    return { coefficient, species, column: termColumn };
  } catch (error) {
    if (error instanceof FormulaError) throw new ReactionError(input, error.column, error.reason);
    throw error;
  }
}

/**
 * Parses a reaction equation: `CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)`, with arrows `->`, `→`,
 * `=`, `<=>`, `⇌`; coefficients as integers, decimals (`0.5`) or fractions (`1/2`, `½`),
 * written before the species with or without a space. A '+' that follows a species without
 * a space is its charge when what follows cannot start a new term (`NH4+ + OH- -> NH3 + H2O`,
 * `Fe+3 + e- -> Fe+2`); `H2+O2` still reads as two species.
 *
 * @throws ReactionError with the 0-based column and the reason
 */
export function parseReaction(text: string): ParsedReaction {
  const arrows = findArrows(text);
  if (arrows.length === 0) {
    throw new ReactionError(text, null, "no arrow: separate reactants and products with '->', '=', or '<=>'");
  }
  if (arrows.length > 1) throw new ReactionError(text, arrows[1].start, 'more than one arrow');
  const arrow = arrows[0];
  if (text.slice(0, arrow.start).trim() === '') throw new ReactionError(text, arrow.start, 'no reactants before the arrow');
  if (text.slice(arrow.end).trim() === '') throw new ReactionError(text, arrow.end, 'no products after the arrow');
  const reactants = splitSide(text, 0, arrow.start).map((t) => parseTerm(text, t.text, t.column, 'left'));
  const products = splitSide(text, arrow.end, text.length).map((t) => parseTerm(text, t.text, t.column, 'right'));
  return { input: text, reactants, products, arrow: arrow.kind };
}

/** Like `parseReaction`, but returns the error instead of throwing it. */
export function tryParseReaction(
  text: string,
): { ok: true; reaction: ParsedReaction } | { ok: false; error: ReactionError } {
  try {
    return { ok: true, reaction: parseReaction(text) };
  } catch (error) {
    if (error instanceof ReactionError) return { ok: false, error };
    throw error;
  }
}

function formatTerm(term: ReactionTerm): string {
  const c = term.coefficient;
  const prefix = c === null || c.equals(Rational.ONE) ? '' : `${c.toString()} `;
  return prefix + term.species.label;
}

/**
 * Canonical text of an equation: single spaces, ' + ' between terms, coefficient 1 omitted,
 * fractions as a/b, phases in IUPAC form, '->' for a forward arrow and '<=>' for an
 * equilibrium: "CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)".
 */
export function normaliseEquation(reaction: ParsedReaction): string {
  const arrow = reaction.arrow === 'equilibrium' ? '<=>' : '->';
  return `${reaction.reactants.map(formatTerm).join(' + ')} ${arrow} ${reaction.products.map(formatTerm).join(' + ')}`;
}

/** Coefficient of a term, 1 when none was written. */
export function coefficientOf(term: ReactionTerm): Rational {
  return term.coefficient ?? Rational.ONE;
}

/** Per-element (and charge) difference reactants − products; empty maps mean balanced. */
export interface BalanceCheck {
  readonly balanced: boolean;
  /** element → (atoms on the left) − (atoms on the right), only non-zero entries */
  readonly elementExcess: Readonly<Record<string, Rational>>;
  /** (charge on the left) − (charge on the right) */
  readonly chargeExcess: Rational;
  /** a sentence for a reviewer, e.g. "O: 4 on the left, 3 on the right" */
  readonly message: string;
}

/** Checks element and charge balance with the coefficients as written (1 when none). */
export function checkBalance(reaction: ParsedReaction): BalanceCheck {
  const left = new Map<string, Rational>();
  const right = new Map<string, Rational>();
  let leftCharge = Rational.ZERO;
  let rightCharge = Rational.ZERO;
  const tally = (terms: readonly ReactionTerm[], into: Map<string, Rational>): Rational => {
    let charge = Rational.ZERO;
    for (const term of terms) {
      const c = coefficientOf(term);
      const { elements, charge: z } = term.species.formula;
      for (const symbol in elements) {
        into.set(symbol, (into.get(symbol) ?? Rational.ZERO).add(c.mul(Rational.fromNumber(elements[symbol]))));
      }
      charge = charge.add(c.mul(Rational.of(z)));
    }
    return charge;
  };
  leftCharge = tally(reaction.reactants, left);
  rightCharge = tally(reaction.products, right);

  const elementExcess: Record<string, Rational> = {};
  const problems: string[] = [];
  for (const symbol of [...new Set([...left.keys(), ...right.keys()])].sort()) {
    const l = left.get(symbol) ?? Rational.ZERO;
    const r = right.get(symbol) ?? Rational.ZERO;
    if (!l.equals(r)) {
      elementExcess[symbol] = l.sub(r);
      problems.push(`${symbol}: ${l.toString()} on the left, ${r.toString()} on the right`);
    }
  }
  const chargeExcess = leftCharge.sub(rightCharge);
  if (!chargeExcess.isZero()) {
    problems.push(`charge: ${leftCharge.toString()} on the left, ${rightCharge.toString()} on the right`);
  }
  return {
    balanced: problems.length === 0,
    elementExcess,
    chargeExcess,
    message: problems.length === 0 ? 'elements and charge balance' : `unbalanced: ${problems.join('; ')}`,
  };
}

/** A species with its signed stoichiometric number ν (negative for reactants). */
export interface StoichiometricEntry {
  readonly label: string;
  readonly species: ParsedSpecies;
  readonly nu: number;
}

/**
 * Signed stoichiometric numbers ν (reactants negative, products positive), one entry per
 * distinct species label; a species on both sides gets its net ν.
 */
export function stoichiometricNumbers(reaction: ParsedReaction): StoichiometricEntry[] {
  const byLabel = new Map<string, { species: ParsedSpecies; nu: Rational }>();
  const add = (terms: readonly ReactionTerm[], sign: number) => {
    for (const term of terms) {
      const entry = byLabel.get(term.species.label);
      const delta = coefficientOf(term).mul(Rational.of(sign));
      if (entry) entry.nu = entry.nu.add(delta);
      else byLabel.set(term.species.label, { species: term.species, nu: delta });
    }
  };
  add(reaction.reactants, -1);
  add(reaction.products, 1);
  return [...byLabel].map(([label, { species, nu }]) => ({ label, species, nu: nu.toNumber() }));
}
