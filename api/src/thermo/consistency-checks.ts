import { P_ATM, P_STD, R, T_REF } from './constants';
import { compileHeatCapacity, intrinsicReferenceValues, needsEntropyAnchor, type HeatCapacityFunction } from './heat-capacity';
import { nasa7RangeAt } from './nasa7';
import { nasa9RangeAt } from './nasa9';
import type { PhaseState } from './phase';
import { shomateRangeAt } from './shomate';
import type { UncertainValue } from './uncertain-value';
import { ATM_TO_BAR_GAS_ENTROPY_CORRECTION, JOULES_PER } from './units';

/**
 * Consistency checks run on every proposal. Each returns pass / warning / failure, a message
 * a reviewer can act on, and the numbers behind it (SI units). Thresholds without a single
 * published source are common practice of data evaluators and are stated with each check.
 */
export type CheckStatus = 'pass' | 'warning' | 'failure';

export interface CheckResult {
  readonly id: string;
  readonly status: CheckStatus;
  readonly message: string;
  readonly numbers: Readonly<Record<string, number | null>>;
}

const RANK: Readonly<Record<CheckStatus, number>> = { pass: 0, warning: 1, failure: 2 };

/** The worst status of several results ('pass' for none). */
export function worstStatus(results: readonly CheckResult[]): CheckStatus {
  return results.reduce<CheckStatus>((worst, r) => (RANK[r.status] > RANK[worst] ? r.status : worst), 'pass');
}

const kJ = (joules: number) => `${(joules / 1000).toFixed(3)} kJ/mol`;
const fixed = (x: number, digits = 3) => x.toFixed(digits);

/**
 * An element in its reference state has ΔfH° = ΔfG° = 0 at every T. Any non-zero value
 * (beyond 1 mJ/mol of float noise) fails.
 */
export function checkReferenceStateZero(input: {
  label: string;
  formationEnthalpy: number;
  formationGibbsEnergy?: number;
}): CheckResult {
  const { label, formationEnthalpy: h, formationGibbsEnergy: g } = input;
  const bad = [Math.abs(h) > 1e-3 ? `ΔfH° = ${kJ(h)}` : null, g !== undefined && Math.abs(g) > 1e-3 ? `ΔfG° = ${kJ(g)}` : null]
    .filter((x): x is string => x !== null);
  return {
    id: 'reference-state-zero',
    status: bad.length === 0 ? 'pass' : 'failure',
    message: bad.length === 0
      ? `${label} is an element in its reference state and has ΔfH° = ΔfG° = 0`
      : `${label} is an element in its reference state, so ΔfH° and ΔfG° must be 0, but ${bad.join(' and ')}`,
    numbers: { formationEnthalpy: h, formationGibbsEnergy: g ?? null },
  };
}

/** Third-law entropy is positive: S° ≤ 0 fails. */
export function checkEntropyPositive(input: { label: string; entropy: number }): CheckResult {
  const ok = input.entropy > 0;
  return {
    id: 'entropy-positive',
    status: ok ? 'pass' : 'failure',
    message: ok
      ? `S°(${input.label}) = ${fixed(input.entropy)} J/(mol·K) is positive`
      : `S°(${input.label}) = ${fixed(input.entropy)} J/(mol·K): a third-law entropy must be positive`,
    numbers: { entropy: input.entropy },
  };
}

/**
 * For one substance at one T: S°(g) > S°(l) > S°(cr). Needs at least two of the three;
 * any inversion fails.
 */
export function checkPhaseEntropyOrder(input: {
  label: string;
  temperature: number;
  gas?: number;
  liquid?: number;
  crystal?: number;
}): CheckResult {
  const ordered = [
    ['g', input.gas],
    ['l', input.liquid],
    ['cr', input.crystal],
  ].filter((e): e is [string, number] => typeof e[1] === 'number');
  const numbers = { temperature: input.temperature, gas: input.gas ?? null, liquid: input.liquid ?? null, crystal: input.crystal ?? null };
  if (ordered.length < 2) {
    return { id: 'phase-entropy-order', status: 'pass', message: `only one phase of ${input.label} given: nothing to compare`, numbers };
  }
  const inversions: string[] = [];
  for (let i = 0; i < ordered.length; i++) {
    for (let j = i + 1; j < ordered.length; j++) {
      if (!(ordered[i][1] > ordered[j][1])) {
        inversions.push(`S°(${ordered[i][0]}) = ${fixed(ordered[i][1])} is not above S°(${ordered[j][0]}) = ${fixed(ordered[j][1])}`);
      }
    }
  }
  return {
    id: 'phase-entropy-order',
    status: inversions.length === 0 ? 'pass' : 'failure',
    message: inversions.length === 0
      ? `${input.label} at ${input.temperature} K: S°(g) > S°(l) > S°(cr) holds`
      : `${input.label} at ${input.temperature} K: ${inversions.join('; ')} J/(mol·K) (expected S°(g) > S°(l) > S°(cr))`,
    numbers,
  };
}

/**
 * Cp° > 0 over the whole valid range (sampled at 400 points plus the range ends), and for an
 * ideal gas Cp° ≥ 5/2·R (translation alone). A gas up to 0.01 J/(mol·K) below 5/2·R passes:
 * monatomic gases sit exactly at 5/2·R and printed coefficients round (common practice).
 */
export function checkHeatCapacityPositive(input: {
  label: string;
  heatCapacity: HeatCapacityFunction;
  idealGas: boolean;
  /** S°(298.15 K), needed only to compile constant and tabulated forms */
  entropy?: number;
}): CheckResult {
  const kernel = compileHeatCapacity(input.heatCapacity, needsEntropyAnchor(input.heatCapacity) ? input.entropy ?? 0 : undefined);
  const out = new Float64Array(3);
  let minCp = Number.POSITIVE_INFINITY;
  let minAt = kernel.tMin;
  const samples = 400;
  for (let i = 0; i <= samples; i++) {
    const t = kernel.tMin + ((kernel.tMax - kernel.tMin) * i) / samples;
    kernel.evaluate(t, out, 0);
    if (out[0] < minCp) {
      minCp = out[0];
      minAt = t;
    }
  }
  const limit = input.idealGas ? 2.5 * R - 0.01 : 0;
  const ok = input.idealGas ? minCp >= limit : minCp > 0;
  const what = input.idealGas ? `5/2·R = ${fixed(2.5 * R)} J/(mol·K)` : '0';
  return {
    id: 'heat-capacity-positive',
    status: ok ? 'pass' : 'failure',
    message: ok
      ? `Cp°(${input.label}) stays above ${what} from ${kernel.tMin} to ${kernel.tMax} K (minimum ${fixed(minCp)} J/(mol·K) at ${fixed(minAt, 1)} K)`
      : `Cp°(${input.label}) falls to ${fixed(minCp)} J/(mol·K) at ${fixed(minAt, 1)} K, below ${what}`,
    numbers: { minimumCp: minCp, atTemperature: minAt, limit },
  };
}

/**
 * A fit (NASA-7, NASA-9, Shomate) reproduces the species' own ΔfH°(298.15) and S°(298.15):
 * pass when each difference is within max(u, floor), warning within 2× that, failure beyond.
 * Floors for the rounding of printed coefficients (common practice): 2 J/mol for H,
 * 0.01 J/(mol·K) for S. For Shomate the increment its F constant gives at 298.15 K must be
 * ≈ 0 as well. Constant and tabulated forms are anchored to the species values by
 * construction (pass).
 */
export function checkFitReproducesReference(input: {
  label: string;
  heatCapacity: HeatCapacityFunction;
  formationEnthalpy: UncertainValue;
  entropy: UncertainValue;
}): CheckResult {
  const intrinsic = intrinsicReferenceValues(input.heatCapacity);
  if (intrinsic === null) {
    return {
      id: 'fit-reproduces-reference',
      status: 'pass',
      message: `the ${input.heatCapacity.kind} form of ${input.label} is anchored to its own ΔfH° and S° by construction`,
      numbers: {},
    };
  }
  const dH = intrinsic.formationEnthalpy + intrinsic.incrementAt298 - input.formationEnthalpy.value;
  const dS = intrinsic.entropy - input.entropy.value;
  const tolH = Math.max(input.formationEnthalpy.uncertainty, 2);
  const tolS = Math.max(input.entropy.uncertainty, 0.01);
  const grade = (d: number, tol: number): CheckStatus => (Math.abs(d) <= tol ? 'pass' : Math.abs(d) <= 2 * tol ? 'warning' : 'failure');
  const status = [grade(dH, tolH), grade(dS, tolS)].reduce<CheckStatus>((w, s) => (RANK[s] > RANK[w] ? s : w), 'pass');
  const detail = `fit H(298.15 K) − ΔfH° = ${fixed(dH, 1)} J/mol (allowed ${fixed(tolH, 1)}), ` +
    `fit S(298.15 K) − S° = ${fixed(dS, 4)} J/(mol·K) (allowed ${fixed(tolS, 4)})`;
  return {
    id: 'fit-reproduces-reference',
    status,
    message: status === 'pass'
      ? `the fit of ${input.label} reproduces its 298.15 K values: ${detail}`
      : `the fit of ${input.label} does not reproduce its own 298.15 K values: ${detail}`,
    numbers: { enthalpyDifference: dH, enthalpyTolerance: tolH, entropyDifference: dS, entropyTolerance: tolS },
  };
}

/**
 * Cp, H and S continuous at every joint of a multi-range fit (both neighbouring ranges
 * evaluated at the joint). Thresholds (common practice for published fits): Cp within
 * 0.1 % (warning to 1 %), H within 10 J/mol (warning to 100 J/mol), S within
 * 0.01 J/(mol·K) (warning to 0.1 J/(mol·K)); beyond fails.
 */
export function checkJointContinuity(input: { label: string; heatCapacity: HeatCapacityFunction }): CheckResult {
  const fn = input.heatCapacity;
  if (fn.kind !== 'nasa7' && fn.kind !== 'nasa9' && fn.kind !== 'shomate') {
    return { id: 'joint-continuity', status: 'pass', message: `the ${fn.kind} form of ${input.label} has no joints`, numbers: {} };
  }
  const at = (i: number, t: number) => {
    if (fn.kind === 'shomate') {
      const v = shomateRangeAt(fn.ranges[i], t);
      return { cp: v.cp, h: v.enthalpyIncrement, s: v.entropy };
    }
    const v = fn.kind === 'nasa7' ? nasa7RangeAt(fn.ranges[i], t, fn.gasConstant) : nasa9RangeAt(fn.ranges[i], t, fn.gasConstant);
    return { cp: v.cp, h: v.enthalpy, s: v.entropy };
  };
  let worst: CheckStatus = 'pass';
  let worstCp = 0, worstH = 0, worstS = 0;
  const problems: string[] = [];
  for (let i = 0; i + 1 < fn.ranges.length; i++) {
    const joint = fn.ranges[i].tMax;
    if (fn.ranges[i + 1].tMin !== joint) continue;
    const below = at(i, joint);
    const above = at(i + 1, joint);
    const dCp = above.cp - below.cp, dH = above.h - below.h, dS = above.s - below.s;
    const relCp = Math.abs(dCp) / Math.abs(below.cp);
    const grades: CheckStatus[] = [
      relCp <= 1e-3 ? 'pass' : relCp <= 1e-2 ? 'warning' : 'failure',
      Math.abs(dH) <= 10 ? 'pass' : Math.abs(dH) <= 100 ? 'warning' : 'failure',
      Math.abs(dS) <= 0.01 ? 'pass' : Math.abs(dS) <= 0.1 ? 'warning' : 'failure',
    ];
    const g = grades.reduce<CheckStatus>((w, s) => (RANK[s] > RANK[w] ? s : w), 'pass');
    if (g !== 'pass') problems.push(`at ${joint} K: ΔCp = ${fixed(dCp, 4)} J/(mol·K), ΔH = ${fixed(dH, 1)} J/mol, ΔS = ${fixed(dS, 4)} J/(mol·K)`);
    if (RANK[g] > RANK[worst]) worst = g;
    if (Math.abs(dCp) > Math.abs(worstCp)) worstCp = dCp;
    if (Math.abs(dH) > Math.abs(worstH)) worstH = dH;
    if (Math.abs(dS) > Math.abs(worstS)) worstS = dS;
  }
  return {
    id: 'joint-continuity',
    status: worst,
    message: worst === 'pass'
      ? `Cp, H and S of ${input.label} are continuous at the range joints`
      : `the fit of ${input.label} jumps at a joint: ${problems.join('; ')}`,
    numbers: { largestCpJump: worstCp, largestEnthalpyJump: worstH, largestEntropyJump: worstS },
  };
}

/**
 * A stored ΔfG° agrees with ΔfH° − T·ΔfS°, where ΔfS° = S°(species) − Σ n·S°(element refs).
 * Tolerance (common practice): 50 J/mol, the consistency of tables printed to 0.01 kJ/mol
 * (the NBS tables differ from their own ΔfH° − TΔfS° by up to ~0.03 kJ/mol); warning up to
 * 5× the tolerance, failure beyond.
 */
export function checkGibbsConsistency(input: {
  label: string;
  temperature?: number;
  formationEnthalpy: number;
  formationGibbsEnergy: number;
  entropy: number;
  elementEntropies: ReadonlyArray<{ readonly n: number; readonly entropy: number }>;
  tolerance?: number;
}): CheckResult {
  const t = input.temperature ?? T_REF;
  const tolerance = input.tolerance ?? 50;
  const dS = input.entropy - input.elementEntropies.reduce((s, e) => s + e.n * e.entropy, 0);
  const expected = input.formationEnthalpy - t * dS;
  const diff = input.formationGibbsEnergy - expected;
  const status: CheckStatus = Math.abs(diff) <= tolerance ? 'pass' : Math.abs(diff) <= 5 * tolerance ? 'warning' : 'failure';
  return {
    id: 'gibbs-consistency',
    status,
    message: `${input.label}: stored ΔfG° = ${kJ(input.formationGibbsEnergy)}, ΔfH° − TΔfS° = ${kJ(expected)} ` +
      `(difference ${fixed(diff, 1)} J/mol, tolerance ${tolerance} J/mol)`,
    numbers: { formationEntropy: dS, expectedGibbsEnergy: expected, difference: diff, tolerance },
  };
}

/**
 * A new value agrees with another source within the combined standard uncertainty:
 * z = |x₁ − x₂| / sqrt(u₁² + u₂²); pass for z ≤ 2, warning for 2 < z ≤ 3, failure for z > 3
 * (common practice: ~95 % and ~99.7 % coverage for normal errors). With both uncertainties
 * zero, any difference fails.
 */
export function checkSourceAgreement(input: {
  quantity: string;
  value: UncertainValue;
  other: UncertainValue;
  otherSource: string;
}): CheckResult {
  const difference = input.value.value - input.other.value;
  const combined = Math.hypot(input.value.uncertainty, input.other.uncertainty);
  const z = combined > 0 ? Math.abs(difference) / combined : difference === 0 ? 0 : Number.POSITIVE_INFINITY;
  const status: CheckStatus = z <= 2 ? 'pass' : z <= 3 ? 'warning' : 'failure';
  const verdict = status === 'pass' ? 'agrees with' : status === 'warning' ? 'is marginal against' : 'disagrees with';
  return {
    id: 'source-agreement',
    status,
    message: `${input.quantity} ${verdict} ${input.otherSource}: difference ${difference.toPrecision(4)}, ` +
      `combined standard uncertainty ${combined.toPrecision(3)}, z = ${Number.isFinite(z) ? z.toFixed(2) : '∞'}`,
    numbers: { difference, combinedUncertainty: combined, z: Number.isFinite(z) ? z : null },
  };
}

/** Kinds of value the plausibility check knows. */
export type QuantityKind = 'formationEnthalpy' | 'entropy' | 'heatCapacity';

const UNIT_SLIPS: ReadonlyArray<readonly [factor: number, description: string]> = [
  [1000, 'kJ entered as J or J/mol read as kJ/mol (×1000)'],
  [1 / 1000, 'J entered as kJ (÷1000)'],
  [JOULES_PER.cal, 'calories entered as joules (×4.184)'],
  [1 / JOULES_PER.cal, 'joules entered as calories (÷4.184)'],
  [JOULES_PER.cal_IT, 'IT calories entered as joules (×4.1868)'],
  [1 / JOULES_PER.cal_IT, 'joules entered as IT calories (÷4.1868)'],
  [-1, 'sign flipped'],
];

/**
 * Is a value plausible for its kind? Catches kJ/J and cal/J slips (common practice of data
 * evaluators; no single published source). Heuristics, value in SI:
 * - against `reference` (another source's value for the same quantity): a ratio within 0.3 %
 *   of 1000, 1/1000, 4.184, 1/4.184, 4.1868, 1/4.1868 or −1 fails, naming the slip;
 * - ΔfH° (J/mol): 0 < |x| < 1000 warns (a kJ/mol value typed as J/mol: very few compounds,
 *   e.g. S(mon), lie within 1 kJ/mol of their elements); |x| > 2·10⁷ warns (larger than any
 *   formula unit in the tables: a factor 1000 slip);
 * - S° (J/(mol·K)): ≤ 0 fails; a gas below 100 warns (the smallest are H, 114.7, and
 *   He, 126.2; a value in cal/(mol·K) lands below); per atom outside 1…100 for condensed
 *   phases, or a gas above 150 + 60·atoms, warns (a ×4.184 slip lands there);
 * - Cp° (J/(mol·K)): ≤ 0 fails; a gas below 5/2·R or above (3·atoms + 1)·R·1.1 (equipartition
 *   ceiling) warns; a condensed phase above 4.5·R per atom (1.5× Dulong–Petit) warns.
 */
export function checkPlausibleMagnitude(input: {
  label: string;
  kind: QuantityKind;
  value: number;
  phase?: PhaseState;
  /** atoms per formula unit, for the per-atom bounds */
  atoms?: number;
  /** another source's value for the same quantity (SI) */
  reference?: number;
  referenceSource?: string;
}): CheckResult {
  const { label, kind, value, phase, atoms, reference } = input;
  const numbers: Record<string, number | null> = { value, reference: reference ?? null, ratio: null };
  const result = (status: CheckStatus, message: string): CheckResult => ({ id: 'plausible-magnitude', status, message, numbers });

  if (reference !== undefined && reference !== 0 && value !== 0) {
    const ratio = value / reference;
    numbers['ratio'] = ratio;
    for (const [factor, description] of UNIT_SLIPS) {
      if (Math.abs(ratio / factor - 1) <= 0.003) {
        return result('failure', `${kind} of ${label} is ${ratio.toPrecision(5)}× the value from ${input.referenceSource ?? 'the other source'}: looks like ${description}`);
      }
    }
  }
  const gas = phase === 'g';
  const n = atoms ?? null;
  switch (kind) {
    case 'formationEnthalpy':
      if (value !== 0 && Math.abs(value) < 1000) {
        return result('warning', `ΔfH°(${label}) = ${value} J/mol is within 1 kJ/mol of zero: was a kJ/mol value entered as J/mol?`);
      }
      if (Math.abs(value) > 2e7) {
        return result('warning', `ΔfH°(${label}) = ${kJ(value)} is larger than any tabulated formation enthalpy: a factor-1000 slip?`);
      }
      return result('pass', `ΔfH°(${label}) = ${kJ(value)} is of a plausible size`);
    case 'entropy':
      if (!(value > 0)) return result('failure', `S°(${label}) = ${value} J/(mol·K) is not positive`);
      if (gas && value < 100) {
        return result('warning', `S°(${label}, g) = ${fixed(value)} J/(mol·K) is below any gas (H: 114.7): entered in cal/(mol·K)?`);
      }
      if (n !== null && gas && value > 150 + 60 * n) {
        return result('warning', `S°(${label}, g) = ${fixed(value)} J/(mol·K) is high for ${n} atoms: a ×4.184 (cal→J twice) slip?`);
      }
      if (n !== null && !gas && (value / n < 1 || value / n > 100)) {
        return result('warning', `S°(${label}) = ${fixed(value)} J/(mol·K) is ${fixed(value / n, 1)} per atom, outside 1…100: a unit slip?`);
      }
      return result('pass', `S°(${label}) = ${fixed(value)} J/(mol·K) is of a plausible size`);
    case 'heatCapacity':
      if (!(value > 0)) return result('failure', `Cp°(${label}) = ${value} J/(mol·K) is not positive`);
      if (gas && value < 2.5 * R - 0.01) {
        return result('warning', `Cp°(${label}, g) = ${fixed(value)} J/(mol·K) is below 5/2·R: entered in cal/(mol·K)?`);
      }
      if (n !== null && gas && value > (3 * n + 1) * R * 1.1) {
        return result('warning', `Cp°(${label}, g) = ${fixed(value)} J/(mol·K) exceeds the equipartition ceiling for ${n} atoms`);
      }
      if (n !== null && !gas && value > 4.5 * R * n) {
        return result('warning', `Cp°(${label}) = ${fixed(value)} J/(mol·K) exceeds 1.5× Dulong–Petit for ${n} atoms`);
      }
      return result('pass', `Cp°(${label}) = ${fixed(value)} J/(mol·K) is of a plausible size`);
  }
}

/**
 * The standard pressure must be stated. 1 bar passes. A gas at 1 atm warns and gives the
 * converted S°(1 bar) = S°(1 atm) + R·ln(1.01325); a condensed phase at 1 atm passes (the
 * difference, −V·α·Δp, is below 10⁻³ J/(mol·K): common practice). Any other pressure, or
 * none, fails.
 */
export function checkStandardPressure(input: {
  label: string;
  pressure: number | null | undefined;
  phase: PhaseState;
  entropy?: number;
}): CheckResult {
  const { label, pressure, phase, entropy } = input;
  const numbers: Record<string, number | null> = { pressure: pressure ?? null, convertedEntropy: null };
  if (pressure === null || pressure === undefined) {
    return { id: 'standard-pressure', status: 'failure', message: `no standard pressure stated for ${label}`, numbers };
  }
  if (pressure === P_STD) {
    return { id: 'standard-pressure', status: 'pass', message: `${label} is given at p° = 1 bar`, numbers };
  }
  if (pressure === P_ATM) {
    if (phase === 'g') {
      const converted = entropy === undefined ? null : entropy + ATM_TO_BAR_GAS_ENTROPY_CORRECTION;
      numbers['convertedEntropy'] = converted;
      return {
        id: 'standard-pressure',
        status: 'warning',
        message: `${label} is given at 1 atm; at 1 bar S° is higher by R·ln(1.01325) = ` +
          `${fixed(ATM_TO_BAR_GAS_ENTROPY_CORRECTION, 5)} J/(mol·K)` +
          (converted === null ? '' : ` (S° = ${fixed(converted, 3)} J/(mol·K))`) + '; ΔfH° is unchanged',
        numbers,
      };
    }
    return { id: 'standard-pressure', status: 'pass', message: `${label} (condensed) at 1 atm: the change to 1 bar is negligible`, numbers };
  }
  return {
    id: 'standard-pressure',
    status: 'failure',
    message: `${label} is given at ${pressure} Pa, which is neither 1 bar nor 1 atm`,
    numbers,
  };
}
