import { checkBalance, coefficientOf, normaliseEquation, type ParsedReaction, type ReactionTerm } from './reaction';
import { gcd, lcm, Rational } from './rational';

/** Outcome of balancing: coefficients, or why there are none or many. */
export type BalanceResult =
  | {
      readonly status: 'balanced';
      /** the reaction with every coefficient filled in */
      readonly reaction: ParsedReaction;
      /** coefficients in term order, reactants then products */
      readonly coefficients: readonly Rational[];
      /** normalised equation text */
      readonly equation: string;
    }
  | { readonly status: 'not-unique'; readonly reason: string; readonly degreesOfFreedom: number }
  | { readonly status: 'impossible'; readonly reason: string };

type Matrix = Rational[][];

/**
 * Reduced row echelon form over exact rationals (Gauss–Jordan).
 * @returns the reduced matrix and the pivot column of each non-zero row
 */
export function reducedRowEchelon(input: readonly (readonly Rational[])[]): { matrix: Matrix; pivots: number[] } {
  const m = input.map((row) => [...row]);
  const rows = m.length;
  const cols = rows === 0 ? 0 : m[0].length;
  const pivots: number[] = [];
  let r = 0;
  for (let c = 0; c < cols && r < rows; c++) {
    let p = r;
    while (p < rows && m[p][c].isZero()) p++;
    if (p === rows) continue;
    [m[r], m[p]] = [m[p], m[r]];
    const pivot = m[r][c];
    for (let k = c; k < cols; k++) m[r][k] = m[r][k].div(pivot);
    for (let i = 0; i < rows; i++) {
      if (i === r || m[i][c].isZero()) continue;
      const factor = m[i][c];
      for (let k = c; k < cols; k++) m[i][k] = m[i][k].sub(factor.mul(m[r][k]));
    }
    pivots.push(c);
    r++;
  }
  return { matrix: m, pivots };
}

/** Basis of the null space of a matrix with `cols` columns, from its RREF. */
function nullSpace(rref: { matrix: Matrix; pivots: number[] }, cols: number): Rational[][] {
  const pivotSet = new Set(rref.pivots);
  const basis: Rational[][] = [];
  for (let free = 0; free < cols; free++) {
    if (pivotSet.has(free)) continue;
    const v = Array.from({ length: cols }, () => Rational.ZERO);
    v[free] = Rational.ONE;
    rref.pivots.forEach((pc, row) => {
      v[pc] = rref.matrix[row][free].neg();
    });
    basis.push(v);
  }
  return basis;
}

/** Smallest integer vector with the same direction (all entries divided by their gcd). */
function toSmallestIntegers(v: readonly Rational[]): Rational[] {
  const denominator = v.reduce((acc, x) => lcm(acc, x.den), 1n);
  const integers = v.map((x) => (x.num * denominator) / x.den);
  const divisor = integers.reduce((acc, x) => gcd(acc, x < 0n ? -x : x), 0n) || 1n;
  return integers.map((x) => Rational.of(x / divisor));
}

function elementRows(terms: readonly ReactionTerm[], signs: readonly number[]): { rows: Matrix; names: string[] } {
  const symbols = new Set<string>();
  let charged = false;
  for (const t of terms) {
    for (const s in t.species.formula.elements) symbols.add(s);
    if (t.species.formula.charge !== 0) charged = true;
  }
  const names = [...symbols].sort();
  const rows = names.map((s) =>
    terms.map((t, j) => Rational.fromNumber(t.species.formula.elements[s] ?? 0).mul(Rational.of(signs[j]))),
  );
  if (charged) {
    names.push('charge');
    rows.push(terms.map((t, j) => Rational.of(t.species.formula.charge * signs[j])));
  }
  return { rows, names };
}

function withCoefficients(reaction: ParsedReaction, coefficients: readonly Rational[]): ParsedReaction {
  const n = reaction.reactants.length;
  return {
    ...reaction,
    reactants: reaction.reactants.map((t, j) => ({ ...t, coefficient: coefficients[j] })),
    products: reaction.products.map((t, j) => ({ ...t, coefficient: coefficients[n + j] })),
  };
}

/** Why no positive solution: species that would need a zero or negative coefficient. */
function signConflict(labels: readonly string[], values: readonly Rational[]): string | null {
  const zero = labels.filter((_, j) => values[j].isZero());
  const negative = labels.filter((_, j) => values[j].sign() < 0);
  const parts: string[] = [];
  if (zero.length > 0) parts.push(`${zero.join(', ')} would take no part (coefficient 0)`);
  if (negative.length > 0) parts.push(`${negative.join(', ')} would need a negative coefficient (belongs on the other side)`);
  return parts.length === 0 ? null : parts.join('; ');
}

/** Elements that occur on one side only: a sure sign the species cannot balance. */
function oneSidedElements(reaction: ParsedReaction): string[] {
  const side = (terms: readonly ReactionTerm[]) => new Set(terms.flatMap((t) => Object.keys(t.species.formula.elements)));
  const left = side(reaction.reactants);
  const right = side(reaction.products);
  return [...left].filter((s) => !right.has(s)).map((s) => `${s} (left only)`)
    .concat([...right].filter((s) => !left.has(s)).map((s) => `${s} (right only)`));
}

/**
 * Balances an equation by exact rational arithmetic. An equation that already balances as
 * written (a missing coefficient counting as 1) is returned as it is. Otherwise coefficients
 * written in the equation are kept and those not written are solved for from element and
 * charge conservation:
 * A_u·x = −A_f·c_f, where A is the element(+charge) matrix (products negated).
 *
 * - No coefficient written anywhere: the null space of A must be one-dimensional with a
 *   strictly positive direction; the smallest integers are returned.
 * - Some written: the system for the others must have exactly one solution, all positive;
 *   the solution is exact and may be fractional (1/2 O2).
 * Otherwise the result says "not unique" (how many free choices remain) or "impossible"
 * (and why: an element on one side only, no non-zero solution, or a species that would need
 * a zero or negative coefficient).
 */
export function balanceReaction(reaction: ParsedReaction): BalanceResult {
  const terms = [...reaction.reactants, ...reaction.products];
  const signs = terms.map((_, j) => (j < reaction.reactants.length ? 1 : -1));
  const labels = terms.map((t) => t.species.label);
  const { rows } = elementRows(terms, signs);
  const unknown = terms.map((t, j) => (t.coefficient === null ? j : -1)).filter((j) => j >= 0);
  const oneSided = oneSidedElements(reaction);

  if (checkBalance(reaction).balanced) {
    const values = terms.map(coefficientOf);
    return { status: 'balanced', reaction: withCoefficients(reaction, values), coefficients: values, equation: normaliseEquation(reaction) };
  }
  if (unknown.length === 0) {
    return { status: 'impossible', reason: `every coefficient is given and the equation does not balance (${checkBalance(reaction).message})` };
  }
  if (oneSided.length > 0) {
    return { status: 'impossible', reason: `element on one side only: ${oneSided.join(', ')}` };
  }

  if (unknown.length === terms.length) {
    const rref = reducedRowEchelon(rows);
    const basis = nullSpace(rref, terms.length);
    if (basis.length === 0) {
      return {
        status: 'impossible',
        reason: 'only the all-zero solution conserves every element: these species cannot form a balanced equation',
      };
    }
    if (basis.length > 1) {
      return {
        status: 'not-unique',
        degreesOfFreedom: basis.length,
        reason: `the balance is not unique: ${basis.length} independent combinations conserve every element ` +
          `(${terms.length} species, rank ${rref.pivots.length}); give some coefficients or split the reaction`,
      };
    }
    let v = toSmallestIntegers(basis[0]);
    if (v.filter((x) => x.sign() < 0).length > v.filter((x) => x.sign() > 0).length) v = v.map((x) => x.neg());
    const conflict = signConflict(labels, v);
    if (conflict) return { status: 'impossible', reason: `no balance with all coefficients positive: ${conflict}` };
    const balanced = withCoefficients(reaction, v);
    return { status: 'balanced', reaction: balanced, coefficients: v, equation: normaliseEquation(balanced) };
  }

  // Some coefficients fixed: solve A_u x = b with b = −A_f c_f.
  const augmented = rows.map((row) => {
    let b = Rational.ZERO;
    terms.forEach((t, j) => {
      if (t.coefficient !== null) b = b.sub(row[j].mul(t.coefficient));
    });
    return [...unknown.map((j) => row[j]), b];
  });
  const rref = reducedRowEchelon(augmented);
  if (rref.pivots.includes(unknown.length)) {
    return {
      status: 'impossible',
      reason: 'the coefficients given leave an imbalance that the species without coefficients cannot make up',
    };
  }
  const freedom = unknown.length - rref.pivots.length;
  if (freedom > 0) {
    return {
      status: 'not-unique',
      degreesOfFreedom: freedom,
      reason: `the balance is not unique: ${freedom} coefficient(s) remain free after those given; give more coefficients`,
    };
  }
  const values = terms.map(coefficientOf);
  rref.pivots.forEach((pc, row) => {
    values[unknown[pc]] = rref.matrix[row][unknown.length];
  });
  const conflict = signConflict(unknown.map((j) => labels[j]), unknown.map((j) => values[j]));
  if (conflict) return { status: 'impossible', reason: `no balance with all coefficients positive: ${conflict}` };
  const balanced = withCoefficients(reaction, values);
  return { status: 'balanced', reaction: balanced, coefficients: values, equation: normaliseEquation(balanced) };
}
