import { T_REF } from './constants';
import { ThermoInputError } from './errors';
import type { ThermoKernel } from './thermo-kernel';

/** A tabulated heat capacity: Cp° / (J mol⁻¹ K⁻¹) at T / K. */
export interface CpPoint {
  readonly temperature: number;
  readonly cp: number;
}

/**
 * Tabulated Cp(T), valid from the first to the last point; the table must include 298.15 K
 * in its span. Integration scheme: Cp is taken as piecewise linear between the points and
 * integrated exactly, H(T) − H(298.15) = ∫Cp dT (trapezoids, exact for linear Cp) and
 * S(T) = S(298.15) + ∫Cp/T dT, which for Cp = c + m·T on a segment is
 * c·ln(T₂/T₁) + m·(T₂ − T₁). Beyond the ends the end segments are extended linearly
 * (only with `extrapolate`).
 */
export interface TabulatedCpFunction {
  readonly kind: 'tabulated';
  readonly points: readonly CpPoint[];
}

/** ∫ Cp dT over [t1, t] for Cp = c1 + m·(T − t1). */
function enthalpyPart(t1: number, c1: number, m: number, t: number): number {
  const dt = t - t1;
  return c1 * dt + 0.5 * m * dt * dt;
}

/** ∫ Cp/T dT over [t1, t] for Cp = c1 + m·(T − t1) = (c1 − m·t1) + m·T. */
function entropyPart(t1: number, c1: number, m: number, t: number): number {
  return (c1 - m * t1) * Math.log(t / t1) + m * (t - t1);
}

/** Compiles a tabulated Cp function anchored at S°(298.15 K) = s298 / (J mol⁻¹ K⁻¹). */
export function compileTabulatedCp(fn: TabulatedCpFunction, s298: number): ThermoKernel {
  const pts = fn.points;
  if (pts.length < 2) throw new ThermoInputError('tabulated.points', 'at least two points are required');
  pts.forEach((p, i) => {
    if (!(Number.isFinite(p.temperature) && p.temperature > 0 && Number.isFinite(p.cp))) {
      throw new ThermoInputError(`tabulated.points[${i}]`, `invalid point T = ${p.temperature} K, Cp = ${p.cp}`);
    }
    if (i > 0 && !(p.temperature > pts[i - 1].temperature)) {
      throw new ThermoInputError(`tabulated.points[${i}]`, 'temperatures must increase strictly');
    }
  });
  const n = pts.length;
  const temps = Float64Array.from(pts, (p) => p.temperature);
  const cps = Float64Array.from(pts, (p) => p.cp);
  if (T_REF < temps[0] || T_REF > temps[n - 1]) {
    throw new ThermoInputError('tabulated.points', `the table must span 298.15 K (it spans ${temps[0]}–${temps[n - 1]} K)`);
  }
  const segmentOf = (t: number): number => {
    let lo = 0;
    let hi = n - 2;
    if (t <= temps[0]) return 0;
    if (t >= temps[n - 1]) return n - 2;
    while (lo < hi) {
      const mid = (lo + hi + 1) >> 1;
      if (temps[mid] <= t) lo = mid;
      else hi = mid - 1;
    }
    return lo;
  };
  const slopes = new Float64Array(n - 1);
  for (let i = 0; i < n - 1; i++) slopes[i] = (cps[i + 1] - cps[i]) / (temps[i + 1] - temps[i]);
  const cumH = new Float64Array(n);
  const cumS = new Float64Array(n);
  for (let i = 1; i < n; i++) {
    cumH[i] = cumH[i - 1] + enthalpyPart(temps[i - 1], cps[i - 1], slopes[i - 1], temps[i]);
    cumS[i] = cumS[i - 1] + entropyPart(temps[i - 1], cps[i - 1], slopes[i - 1], temps[i]);
  }
  const r = segmentOf(T_REF);
  const hOffset = cumH[r] + enthalpyPart(temps[r], cps[r], slopes[r], T_REF);
  const sOffset = cumS[r] + entropyPart(temps[r], cps[r], slopes[r], T_REF);
  return {
    tMin: temps[0],
    tMax: temps[n - 1],
    evaluate(t: number, out: Float64Array, offset: number): boolean {
      const k = segmentOf(t);
      const t1 = temps[k], c1 = cps[k], m = slopes[k];
      out[offset] = c1 + m * (t - t1);
      out[offset + 1] = cumH[k] + enthalpyPart(t1, c1, m, t) - hOffset;
      out[offset + 2] = s298 + cumS[k] + entropyPart(t1, c1, m, t) - sOffset;
      return t < temps[0] || t > temps[n - 1];
    },
  };
}
