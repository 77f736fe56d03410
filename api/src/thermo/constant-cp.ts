import { T_REF } from './constants';
import { ThermoInputError } from './errors';
import type { ThermoKernel } from './thermo-kernel';

/**
 * Constant heat capacity on [tMin, tMax] K: H(T) − H(298.15) = Cp·(T − 298.15);
 * S(T) = S(298.15) + Cp·ln(T/298.15), with S(298.15) taken from the species data.
 * Cp = 0 is accepted (the Ellingham approximation ΔrCp ≈ 0); negative Cp is not.
 */
export interface ConstantCpFunction {
  readonly kind: 'constant';
  /** Cp° / (J mol⁻¹ K⁻¹) */
  readonly cp: number;
  readonly tMin: number;
  readonly tMax: number;
}

/** Compiles a constant-Cp function anchored at S°(298.15 K) = s298 / (J mol⁻¹ K⁻¹). */
export function compileConstantCp(fn: ConstantCpFunction, s298: number): ThermoKernel {
  if (!(Number.isFinite(fn.cp) && fn.cp >= 0)) throw new ThermoInputError('constant.cp', `must be ≥ 0, got ${fn.cp}`);
  if (!(fn.tMin > 0 && fn.tMax > fn.tMin)) {
    throw new ThermoInputError('constant.range', `invalid range ${fn.tMin}–${fn.tMax} K`);
  }
  const { cp, tMin, tMax } = fn;
  return {
    tMin,
    tMax,
    evaluate(t: number, out: Float64Array, offset: number): boolean {
      out[offset] = cp;
      out[offset + 1] = cp * (t - T_REF);
      out[offset + 2] = s298 + cp * Math.log(t / T_REF);
      return t < tMin || t > tMax;
    },
  };
}
