import { R, T_REF } from './constants';
import { findRange, rangeIndexOrNearest, validateCoefficients, validateRanges, type ThermoKernel } from './thermo-kernel';

/** One range of a NASA 9-coefficient fit on [tMin, tMax] K. */
export interface Nasa9Range {
  readonly tMin: number;
  readonly tMax: number;
  /** a1…a7 of Cp/R = a1T⁻² + a2T⁻¹ + a3 + a4T + a5T² + a6T³ + a7T⁴ */
  readonly coefficients: readonly number[];
  /** integration constant of H/R / K */
  readonly b1: number;
  /** integration constant of S/R */
  readonly b2: number;
}

/**
 * NASA 9-coefficient polynomials (McBride, Zehe & Gordon, NASA TP-2002-211556), any number
 * of ranges: H/(RT) = −a1T⁻² + a2 lnT/T + a3 + a4T/2 + a5T²/3 + a6T³/4 + a7T⁴/5 + b1/T;
 * S/R = −a1T⁻²/2 − a2T⁻¹ + a3 lnT + a4T + a5T²/2 + a6T³/3 + a7T⁴/4 + b2. H is on the
 * ΔfH°(298.15 K) scale. At a joint the lower range is used.
 */
export interface Nasa9Function {
  readonly kind: 'nasa9';
  readonly ranges: readonly Nasa9Range[];
  /** R the coefficients are scaled by; defaults to CODATA 2018 */
  readonly gasConstant?: number;
}

function nasa9At(a: Float64Array, k: number, rGas: number, t: number, out: Float64Array, offset: number): number {
  const a1 = a[k], a2 = a[k + 1], a3 = a[k + 2], a4 = a[k + 3], a5 = a[k + 4], a6 = a[k + 5], a7 = a[k + 6];
  const inv = 1 / t;
  const lnT = Math.log(t);
  out[offset] = rGas * (inv * (a1 * inv + a2) + a3 + t * (a4 + t * (a5 + t * (a6 + t * a7))));
  out[offset + 2] = rGas * (-0.5 * a1 * inv * inv - a2 * inv + a3 * lnT + t * (a4 + t * (a5 / 2 + t * (a6 / 3 + t * (a7 / 4)))) + a[k + 8]);
  return rGas * (-a1 * inv + a2 * lnT + t * (a3 + t * (a4 / 2 + t * (a5 / 3 + t * (a6 / 4 + t * (a7 / 5))))) + a[k + 7]);
}

/** Validates and compiles a NASA-9 function. */
export function compileNasa9(fn: Nasa9Function): ThermoKernel & { readonly h298: number } {
  validateRanges(fn.ranges, 'nasa9.ranges');
  fn.ranges.forEach((r, i) => validateCoefficients([...r.coefficients, r.b1, r.b2], 9, `nasa9.ranges[${i}].coefficients`));
  const rGas = fn.gasConstant ?? R;
  const ranges = fn.ranges.map((r) => ({ tMin: r.tMin, tMax: r.tMax }));
  const a = Float64Array.from(fn.ranges.flatMap((r) => [...r.coefficients, r.b1, r.b2]));
  const h298 = nasa9At(a, 9 * rangeIndexOrNearest(findRange(ranges, T_REF)), rGas, T_REF, new Float64Array(3), 0);
  return {
    tMin: ranges[0].tMin,
    tMax: ranges[ranges.length - 1].tMax,
    h298,
    evaluate(t: number, out: Float64Array, offset: number): boolean {
      const code = findRange(ranges, t);
      out[offset + 1] = nasa9At(a, 9 * rangeIndexOrNearest(code), rGas, t, out, offset) - h298;
      return code < 0;
    },
  };
}

/**
 * Cp° / (J mol⁻¹ K⁻¹), H° on the ΔfH° scale / (J mol⁻¹) and S° / (J mol⁻¹ K⁻¹) of one range
 * at T, whether or not T is inside it (for joint checks).
 */
export function nasa9RangeAt(range: Nasa9Range, temperature: number, gasConstant = R): { cp: number; enthalpy: number; entropy: number } {
  const out = new Float64Array(3);
  const a = Float64Array.from([...range.coefficients, range.b1, range.b2]);
  const enthalpy = nasa9At(a, 0, gasConstant, temperature, out, 0);
  return { cp: out[0], enthalpy, entropy: out[2] };
}
