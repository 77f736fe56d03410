import { findRange, rangeIndexOrNearest, validateCoefficients, validateRanges, type ThermoKernel } from './thermo-kernel';

/** One range of a Shomate fit, coefficients in the published (NIST WebBook) units. */
export interface ShomateRange {
  readonly tMin: number;
  readonly tMax: number;
  /** A…E in J/(mol·K) with t = T/1000 K; F and H in kJ/mol; G in J/(mol·K) */
  readonly A: number;
  readonly B: number;
  readonly C: number;
  readonly D: number;
  readonly E: number;
  readonly F: number;
  readonly G: number;
  readonly H: number;
}

/**
 * Shomate (1954) equations, t = T/1000 K:
 * Cp = A + Bt + Ct² + Dt³ + E/t² (J/(mol·K));
 * H − H(298.15) = At + Bt²/2 + Ct³/3 + Dt⁴/4 − E/t + F − H (kJ/mol);
 * S = A ln t + Bt + Ct²/2 + Dt³/3 − E/(2t²) + G (J/(mol·K)). H is ΔfH°(298.15) in kJ/mol.
 */
export interface ShomateFunction {
  readonly kind: 'shomate';
  readonly ranges: readonly ShomateRange[];
}

const KEYS = ['A', 'B', 'C', 'D', 'E', 'F', 'G', 'H'] as const;

function shomateAt(c: Float64Array, k: number, temperature: number, out: Float64Array, offset: number): void {
  const t = temperature / 1000;
  const A = c[k], B = c[k + 1], C = c[k + 2], D = c[k + 3], E = c[k + 4];
  const inv2 = 1 / (t * t);
  out[offset] = A + t * (B + t * (C + t * D)) + E * inv2;
  out[offset + 1] = 1000 * (t * (A + t * (B / 2 + t * (C / 3 + t * (D / 4)))) - E / t + c[k + 5] - c[k + 7]);
  out[offset + 2] = A * Math.log(t) + t * (B + t * (C / 2 + t * (D / 3))) - 0.5 * E * inv2 + c[k + 6];
}

/** Validates and compiles a Shomate function (results in SI: J, mol, K). */
export function compileShomate(fn: ShomateFunction): ThermoKernel {
  validateRanges(fn.ranges, 'shomate.ranges');
  fn.ranges.forEach((r, i) => validateCoefficients(KEYS.map((key) => r[key]), 8, `shomate.ranges[${i}]`));
  const ranges = fn.ranges.map((r) => ({ tMin: r.tMin, tMax: r.tMax }));
  const c = Float64Array.from(fn.ranges.flatMap((r) => KEYS.map((key) => r[key])));
  return {
    tMin: ranges[0].tMin,
    tMax: ranges[ranges.length - 1].tMax,
    evaluate(t: number, out: Float64Array, offset: number): boolean {
      const code = findRange(ranges, t);
      shomateAt(c, 8 * rangeIndexOrNearest(code), t, out, offset);
      return code < 0;
    },
  };
}

/**
 * Cp° / (J mol⁻¹ K⁻¹), H° − H°(298.15) / (J mol⁻¹) and S° / (J mol⁻¹ K⁻¹) of one range at T,
 * whether or not T is inside it (for joint checks).
 */
export function shomateRangeAt(range: ShomateRange, temperature: number): { cp: number; enthalpyIncrement: number; entropy: number } {
  const out = new Float64Array(3);
  shomateAt(Float64Array.from(KEYS.map((key) => range[key])), 0, temperature, out, 0);
  return { cp: out[0], enthalpyIncrement: out[1], entropy: out[2] };
}
