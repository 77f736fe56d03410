/**
 * NASA 7-coefficient polynomials in the fixed-column layout of NASA TM-4513 (McBride, Gordon &
 * Reno, 1993), the 80-column, four-line record that combustion and equilibrium codes read
 * (the same layout as the THERMO section of a CHEMKIN input):
 *
 *   line 1  cols 1–18 species name, 19–24 date/reference code (here the release label),
 *           25–44 four element slots (symbol in 2 columns, count in 3), 45 phase (G, L, S),
 *           46–55 T low, 56–65 T high (F10.3), 66–73 T common (F8.3), 74–78 a fifth element
 *           slot, 80 the record line number 1
 *   line 2  a1–a5 of the upper range (5E15.8), 80: 2
 *   line 3  a6, a7 of the upper range, a1–a3 of the lower range, 80: 3
 *   line 4  a4–a7 of the lower range, 80: 4
 *
 * Cp/R = a1 + a2T + a3T² + a4T³ + a5T⁴; H/(RT) = a1 + a2T/2 + a3T²/3 + a4T³/4 + a5T⁴/5 + a6/T;
 * S/R = a1 lnT + a2T + a3T²/2 + a4T³/3 + a5T⁴/4 + a7 (T in K).
 */

export interface Nasa7Record {
  /** up to 18 characters, no spaces */
  name: string;
  /** six characters: the date or reference code */
  code: string;
  /** element symbol → atoms (integers); an ion adds 'E' for its electrons */
  elements: Array<[string, number]>;
  phase: 'G' | 'L' | 'S';
  tLow: number;
  tCommon: number;
  tHigh: number;
  /** a1…a7 of the range above tCommon */
  upper: readonly number[];
  /** a1…a7 of the range below tCommon */
  lower: readonly number[];
}

/** A stored NASA-7 fit as the exporter sees it. */
export interface Nasa7Source {
  name: string;
  code: string;
  composition: Record<string, number>;
  charge: number;
  phase: string;
  ranges: Array<{ tMin: number; tMax: number; coefficients?: number[] }>;
}

/** Fortran 1PE15.8: sign or space, d.dddddddd, E±dd, right-aligned in 15 columns. */
export function e15(x: number): string {
  if (!Number.isFinite(x)) throw new RangeError(`cannot write ${x} in E15.8`);
  for (let digits = 8; digits >= 1; digits--) {
    const [mantissa, exponent] = x.toExponential(digits).split('e');
    const e = Number(exponent);
    const text = `${mantissa}E${e < 0 ? '-' : '+'}${String(Math.abs(e)).padStart(2, '0')}`;
    if (text.length <= 15) return text.padStart(15);
  }
  throw new RangeError(`cannot write ${x} in 15 columns`);
}

const fixed = (x: number, width: number) => {
  const text = x.toFixed(3);
  if (text.length > width) throw new RangeError(`${x} does not fit in ${width} columns`);
  return text.padStart(width);
};

function elementSlot(entry: [string, number] | undefined): string {
  if (!entry) return ' '.repeat(5);
  const [symbol, count] = entry;
  return symbol.toUpperCase().padEnd(2).slice(0, 2) + String(count).padStart(3);
}

/** The four 80-column lines of one species. */
export function nasa7Lines(record: Nasa7Record): string[] {
  const slots = record.elements;
  const line1 =
    record.name.slice(0, 18).padEnd(18) +
    record.code.slice(0, 6).padEnd(6) +
    [0, 1, 2, 3].map((i) => elementSlot(slots[i])).join('') +
    record.phase +
    fixed(record.tLow, 10) +
    fixed(record.tHigh, 10) +
    fixed(record.tCommon, 8) +
    elementSlot(slots[4]) +
    ' 1';
  const coefficients = [...record.upper, ...record.lower].map(e15);
  const line = (values: string[], n: number) => values.join('').padEnd(79) + String(n);
  return [line1, line(coefficients.slice(0, 5), 2), line(coefficients.slice(5, 10), 3), line(coefficients.slice(10, 14), 4)];
}

/**
 * The record of a stored fit, or why it cannot be written in this layout (more than two ranges,
 * fractional atom counts, more than five element slots, a name with spaces).
 */
export function nasa7Record(source: Nasa7Source): Nasa7Record | { skipped: string } {
  const ranges = source.ranges;
  if (ranges.length === 0 || ranges.length > 2) return { skipped: `${ranges.length} temperature ranges (the layout holds one or two)` };
  if (ranges.some((r) => !r.coefficients || r.coefficients.length !== 7)) return { skipped: 'not seven coefficients per range' };
  const elements: Array<[string, number]> = Object.entries(source.composition).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
  if (elements.some(([, n]) => !Number.isInteger(n) || n > 999)) return { skipped: 'fractional or very large atom counts' };
  if (source.charge !== 0) elements.push(['E', -source.charge]);
  if (elements.length > 5) return { skipped: 'more than five element slots' };
  const name = source.name.replace(/\s+/g, '');
  if (name.length > 18) return { skipped: `name "${name}" is longer than 18 characters` };
  const [lower, upper = lower] = ranges;
  return {
    name,
    code: source.code,
    elements,
    phase: source.phase === 'g' ? 'G' : source.phase === 'l' ? 'L' : 'S',
    tLow: lower.tMin,
    tCommon: lower.tMax,
    tHigh: upper.tMax,
    upper: upper.coefficients!,
    lower: lower.coefficients!,
  };
}
