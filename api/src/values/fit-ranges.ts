import type { FitForm } from './value-vocabulary';

/**
 * One temperature range of a heat-capacity function, as stored in `heat_capacity_fits.ranges`.
 *
 * Coefficients per form (forms as published; see ../shared domain notes):
 * - `constant`: [Cp] with Cp in J/(mol·K).
 * - `shomate`: [A, B, C, D, E, F, G, H]; t = T/1000 K; Cp in J/(mol·K), H − H(298.15) in kJ/mol.
 * - `nasa7`: [a1 … a7] (McBride, Gordon & Reno, NASA TM-4513, 1993); T in K, Cp/R, H/(RT), S/R
 *   dimensionless, with H(298.15 K) = ΔfH°(298.15 K).
 * - `nasa9`: [a1 … a7, b1, b2] (McBride, Zehe & Gordon, NASA TP-2002-211556); same conventions.
 * - `tabulated`: `points` = [[T / K, Cp / (J/(mol·K))], …], strictly increasing T within the range.
 *
 * Ranges follow each other without gaps: the first starts at the fit's Tmin, each next one
 * starts where the previous ended, the last ends at Tmax.
 */
export type FitRange =
  | { tMin: number; tMax: number; coefficients: number[] }
  | { tMin: number; tMax: number; points: [number, number][] };

/** Coefficient count of each coefficient form. */
export const COEFFICIENT_COUNTS: Readonly<Record<Exclude<FitForm, 'tabulated'>, number>> = {
  constant: 1,
  shomate: 8,
  nasa7: 7,
  nasa9: 9,
};

const isFiniteNumber = (x: unknown): x is number => typeof x === 'number' && Number.isFinite(x);

/**
 * Everything wrong with a fit's ranges, as messages naming the range (1-based); empty when
 * valid. Mirrors the database function `kx_fit_ranges_are_valid` so that the API can answer
 * 422 with a reason before the database refuses the row.
 *
 * @param tMin fit's lower limit / K
 * @param tMax fit's upper limit / K
 */
export function fitRangeProblems(form: FitForm, tMin: number, tMax: number, ranges: unknown): string[] {
  const problems: string[] = [];
  if (!(isFiniteNumber(tMin) && isFiniteNumber(tMax) && tMin > 0 && tMax > tMin)) {
    problems.push(`Tmin and Tmax must satisfy 0 K < Tmin < Tmax (got ${tMin}, ${tMax})`);
  }
  if (!Array.isArray(ranges) || ranges.length === 0) {
    problems.push('ranges must be a non-empty list');
    return problems;
  }
  let previousEnd: number | undefined;
  ranges.forEach((range: unknown, index) => {
    const at = `range ${index + 1}`;
    if (typeof range !== 'object' || range === null || Array.isArray(range)) {
      problems.push(`${at} must be an object with tMin, tMax and coefficients or points`);
      return;
    }
    const r = range as Record<string, unknown>;
    if (!isFiniteNumber(r.tMin) || !isFiniteNumber(r.tMax) || r.tMin <= 0 || r.tMax <= r.tMin) {
      problems.push(`${at}: tMin and tMax must be numbers with 0 K < tMin < tMax`);
      return;
    }
    const expectedStart = previousEnd ?? tMin;
    if (r.tMin !== expectedStart) {
      problems.push(previousEnd === undefined
        ? `${at} starts at ${r.tMin} K, not at the fit's Tmin ${tMin} K`
        : `${at} starts at ${r.tMin} K, not where range ${index} ended (${previousEnd} K)`);
    }
    previousEnd = r.tMax;
    if (form === 'tabulated') {
      problems.push(...pointProblems(at, r.tMin, r.tMax, r.points));
    } else {
      const expected = COEFFICIENT_COUNTS[form];
      if (!Array.isArray(r.coefficients) || r.coefficients.length !== expected || !r.coefficients.every(isFiniteNumber)) {
        problems.push(`${at}: ${form} needs exactly ${expected} numeric coefficient${expected === 1 ? '' : 's'}`);
      }
    }
  });
  if (previousEnd !== undefined && previousEnd !== tMax) {
    problems.push(`the last range ends at ${previousEnd} K, not at the fit's Tmax ${tMax} K`);
  }
  return problems;
}

function pointProblems(at: string, lo: number, hi: number, points: unknown): string[] {
  if (!Array.isArray(points) || points.length < 2) return [`${at}: tabulated data need at least two [T, Cp] points`];
  const problems: string[] = [];
  let previousT = -Infinity;
  points.forEach((point: unknown, i) => {
    if (!Array.isArray(point) || point.length !== 2 || !isFiniteNumber(point[0]) || !isFiniteNumber(point[1])) {
      problems.push(`${at}, point ${i + 1}: must be [T, Cp] numbers`);
      return;
    }
    const [t, cp] = point;
    if (t < lo || t > hi) problems.push(`${at}, point ${i + 1}: T = ${t} K lies outside ${lo}–${hi} K`);
    if (t <= previousT) problems.push(`${at}, point ${i + 1}: temperatures must increase`);
    if (cp <= 0) problems.push(`${at}, point ${i + 1}: Cp must be positive`);
    previousT = t;
  });
  return problems;
}
