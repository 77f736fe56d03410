import { T_REF } from './constants';
import { compileConstantCp, type ConstantCpFunction } from './constant-cp';
import { OutOfRangeError, ThermoInputError } from './errors';
import { compileNasa7, type Nasa7Function } from './nasa7';
import { compileNasa9, type Nasa9Function } from './nasa9';
import { compileShomate, type ShomateFunction } from './shomate';
import { compileTabulatedCp, type TabulatedCpFunction } from './tabulated-cp';
import type { ThermoKernel } from './thermo-kernel';

export type { ConstantCpFunction } from './constant-cp';
export type { Nasa7Function, Nasa7Range } from './nasa7';
export type { Nasa9Function, Nasa9Range } from './nasa9';
export type { ShomateFunction, ShomateRange } from './shomate';
export type { CpPoint, TabulatedCpFunction } from './tabulated-cp';

/**
 * A standard-state heat-capacity function in one of the published forms. Treat it as
 * immutable: compiled kernels are cached per object.
 */
export type HeatCapacityFunction =
  | ConstantCpFunction
  | ShomateFunction
  | Nasa7Function
  | Nasa9Function
  | TabulatedCpFunction;

/** Thermodynamic functions of one species at one temperature (SI units). */
export interface ThermoPoint {
  /** T / K */
  readonly temperature: number;
  /** Cp° / (J mol⁻¹ K⁻¹) */
  readonly cp: number;
  /** H°(T) − H°(298.15 K) / (J mol⁻¹) */
  readonly enthalpyIncrement: number;
  /** S°(T) / (J mol⁻¹ K⁻¹) */
  readonly entropy: number;
  /** −[G°(T) − H°(298.15 K)]/T / (J mol⁻¹ K⁻¹), the tables' Gibbs energy function */
  readonly gibbsEnergyFunction: number;
  /** true when T was outside the valid range and the result is an extrapolation */
  readonly extrapolated: boolean;
}

/** Options of every evaluation. */
export interface EvaluationOptions {
  /**
   * S°(298.15 K) / (J mol⁻¹ K⁻¹) from the species data: required by the constant and
   * tabulated forms, which carry no entropy constant; ignored by the others.
   */
  readonly s298?: number;
  /** evaluate outside the valid range instead of refusing (the result is flagged) */
  readonly extrapolate?: boolean;
  /** what is evaluated, for error messages (e.g. "H2O(g)") */
  readonly subject?: string;
}

/** True for the forms that need S°(298.15 K) from the species data. */
export function needsEntropyAnchor(fn: HeatCapacityFunction): boolean {
  return fn.kind === 'constant' || fn.kind === 'tabulated';
}

const cache = new WeakMap<HeatCapacityFunction, { s298: number | undefined; kernel: ThermoKernel }>();

/**
 * Validates a heat-capacity function and compiles it into an allocation-free kernel.
 * @param s298 S°(298.15 K) / (J mol⁻¹ K⁻¹), required for the constant and tabulated forms
 * @throws ThermoInputError for a malformed function or a missing anchor
 */
export function compileHeatCapacity(fn: HeatCapacityFunction, s298?: number): ThermoKernel {
  const anchor = needsEntropyAnchor(fn) ? s298 : undefined;
  const cached = cache.get(fn);
  if (cached && cached.s298 === anchor) return cached.kernel;
  if (needsEntropyAnchor(fn) && !(typeof anchor === 'number' && Number.isFinite(anchor))) {
    throw new ThermoInputError('s298', `the ${fn.kind} form needs S°(298.15 K) from the species data`);
  }
  let kernel: ThermoKernel;
  switch (fn.kind) {
    case 'constant':
      kernel = compileConstantCp(fn, anchor!);
      break;
    case 'tabulated':
      kernel = compileTabulatedCp(fn, anchor!);
      break;
    case 'shomate':
      kernel = compileShomate(fn);
      break;
    case 'nasa7':
      kernel = compileNasa7(fn);
      break;
    case 'nasa9':
      kernel = compileNasa9(fn);
      break;
    default:
      throw new ThermoInputError('kind', `unknown heat-capacity form '${(fn as { kind: string }).kind}'`);
  }
  cache.set(fn, { s298: anchor, kernel });
  return kernel;
}

/** Valid temperature range of a function / K (from its first to its last range). */
export function validRange(fn: HeatCapacityFunction): { tMin: number; tMax: number } {
  if (fn.kind === 'constant') return { tMin: fn.tMin, tMax: fn.tMax };
  if (fn.kind === 'tabulated') {
    return { tMin: fn.points[0]?.temperature ?? Number.NaN, tMax: fn.points[fn.points.length - 1]?.temperature ?? Number.NaN };
  }
  const kernel = compileHeatCapacity(fn);
  return { tMin: kernel.tMin, tMax: kernel.tMax };
}

/**
 * Cp°, H° − H°(298.15 K), S° and −(G° − H°(298.15 K))/T at T.
 * @param temperature T / K
 * @throws OutOfRangeError when T is outside the valid range and `extrapolate` is not set
 * @throws ThermoInputError when T is not a positive number or the function is malformed
 */
export function evaluateHeatCapacity(
  fn: HeatCapacityFunction,
  temperature: number,
  options: EvaluationOptions = {},
): ThermoPoint {
  if (!(Number.isFinite(temperature) && temperature > 0)) {
    throw new ThermoInputError('temperature', `must be a positive number of kelvin, got ${temperature}`);
  }
  const kernel = compileHeatCapacity(fn, options.s298);
  const out = new Float64Array(3);
  const extrapolated = kernel.evaluate(temperature, out, 0);
  if (extrapolated && !options.extrapolate) {
    throw new OutOfRangeError(temperature, kernel.tMin, kernel.tMax, options.subject);
  }
  return {
    temperature,
    cp: out[0],
    enthalpyIncrement: out[1],
    entropy: out[2],
    gibbsEnergyFunction: out[2] - out[1] / temperature,
    extrapolated,
  };
}

/**
 * The 298.15 K values a fit carries in itself, to compare with the species' own values:
 * NASA forms — H on the ΔfH scale at 298.15 K and S(298.15 K); Shomate — its H constant
 * (ΔfH°, converted to J/mol), the increment its F constant gives at 298.15 K (≈ 0 for a
 * consistent fit) and S(298.15 K). Constant and tabulated forms carry none (null).
 */
export function intrinsicReferenceValues(
  fn: HeatCapacityFunction,
): { formationEnthalpy: number; entropy: number; incrementAt298: number } | null {
  const out = new Float64Array(3);
  switch (fn.kind) {
    case 'nasa7':
    case 'nasa9': {
      const kernel = fn.kind === 'nasa7' ? compileNasa7(fn) : compileNasa9(fn);
      kernel.evaluate(T_REF, out, 0);
      return { formationEnthalpy: kernel.h298, entropy: out[2], incrementAt298: 0 };
    }
    case 'shomate': {
      compileHeatCapacity(fn).evaluate(T_REF, out, 0);
      const range = fn.ranges.find((r) => T_REF >= r.tMin && T_REF <= r.tMax) ?? fn.ranges[0];
      return { formationEnthalpy: range.H * 1000, entropy: out[2], incrementAt298: out[1] };
    }
    default:
      return null;
  }
}
