import { R, T_REF } from './constants';
import { findRange, rangeIndexOrNearest, validateCoefficients, validateRanges, type ThermoKernel } from './thermo-kernel';

/** One range of a NASA 7-coefficient fit: a1…a7 on [tMin, tMax] K. */
export interface Nasa7Range {
  readonly tMin: number;
  readonly tMax: number;
  /** a1…a7 (Cp/R = a1 + a2T + a3T² + a4T³ + a5T⁴; a6 enthalpy, a7 entropy constants) */
  readonly coefficients: readonly number[];
}

/**
 * NASA 7-coefficient polynomials (McBride, Gordon & Reno, NASA TM-4513, 1993), any number
 * of ranges: Cp/R = a1 + a2T + a3T² + a4T³ + a5T⁴; H/(RT) = a1 + a2T/2 + a3T²/3 + a4T³/4 +
 * a5T⁴/5 + a6/T; S/R = a1 lnT + a2T + a3T²/2 + a4T³/3 + a5T⁴/4 + a7. H is on the scale where
 * H(298.15 K) = ΔfH°(298.15 K). At a joint the lower range is used.
 */
export interface Nasa7Function {
  readonly kind: 'nasa7';
  readonly ranges: readonly Nasa7Range[];
  /** R the coefficients are scaled by; defaults to CODATA 2018 (constants.ts) */
  readonly gasConstant?: number;
}

/** Absolute H (ΔfH scale) / (J/mol), Cp, S of one NASA-7 range at T, into out[offset…]. */
function nasa7At(a: Float64Array, k: number, rGas: number, t: number, out: Float64Array, offset: number): number {
  const a1 = a[k], a2 = a[k + 1], a3 = a[k + 2], a4 = a[k + 3], a5 = a[k + 4];
  out[offset] = rGas * (a1 + t * (a2 + t * (a3 + t * (a4 + t * a5))));
  out[offset + 2] = rGas * (a1 * Math.log(t) + t * (a2 + t * (a3 / 2 + t * (a4 / 3 + t * (a5 / 4)))) + a[k + 6]);
  return rGas * (t * (a1 + t * (a2 / 2 + t * (a3 / 3 + t * (a4 / 4 + t * (a5 / 5))))) + a[k + 5]);
}

/** Validates and compiles a NASA-7 function. */
export function compileNasa7(fn: Nasa7Function): ThermoKernel & { readonly h298: number } {
  validateRanges(fn.ranges, 'nasa7.ranges');
  fn.ranges.forEach((r, i) => validateCoefficients(r.coefficients, 7, `nasa7.ranges[${i}].coefficients`));
  const rGas = fn.gasConstant ?? R;
  const ranges = fn.ranges.map((r) => ({ tMin: r.tMin, tMax: r.tMax }));
  const a = Float64Array.from(fn.ranges.flatMap((r) => r.coefficients));
  const scratch = new Float64Array(3);
  const h298 = nasa7At(a, 7 * rangeIndexOrNearest(findRange(ranges, T_REF)), rGas, T_REF, scratch, 0);
  return {
    tMin: ranges[0].tMin,
    tMax: ranges[ranges.length - 1].tMax,
    h298,
    evaluate(t: number, out: Float64Array, offset: number): boolean {
      const code = findRange(ranges, t);
      out[offset + 1] = nasa7At(a, 7 * rangeIndexOrNearest(code), rGas, t, out, offset) - h298;
      return code < 0;
    },
  };
}

/**
 * Cp° / (J mol⁻¹ K⁻¹), H° on the ΔfH° scale / (J mol⁻¹) and S° / (J mol⁻¹ K⁻¹) of one range
 * at T, whether or not T is inside it (for joint checks).
 */
export function nasa7RangeAt(range: Nasa7Range, temperature: number, gasConstant = R): { cp: number; enthalpy: number; entropy: number } {
  const out = new Float64Array(3);
  const enthalpy = nasa7At(Float64Array.from(range.coefficients), 0, gasConstant, temperature, out, 0);
  return { cp: out[0], enthalpy, entropy: out[2] };
}
