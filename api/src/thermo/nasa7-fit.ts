import { R, T_REF } from './constants';
import { ThermoInputError } from './errors';
import { leastSquares } from './linear-algebra';
import { nasa7RangeAt, type Nasa7Function } from './nasa7';
import type { CpPoint } from './tabulated-cp';

/** Inputs of a two-range NASA-7 fit. */
export interface Nasa7FitInput {
  /** tabulated Cp° / (J mol⁻¹ K⁻¹) at T / K; at least 6 points in each range */
  readonly points: readonly CpPoint[];
  /** joint between the ranges / K (commonly 1000 K) */
  readonly tMid: number;
  /** ΔfH°(298.15 K) / (J mol⁻¹): the fit's H(298.15 K) equals it exactly */
  readonly formationEnthalpy: number;
  /** S°(298.15 K) / (J mol⁻¹ K⁻¹): the fit's S(298.15 K) equals it exactly */
  readonly entropy: number;
  /** R to scale the coefficients by; default CODATA 2018 */
  readonly gasConstant?: number;
}

/** A fitted two-range NASA-7 set with its residuals. */
export interface Nasa7FitResult {
  readonly fit: Nasa7Function;
  readonly residuals: {
    /** max |Cp,fit − Cp,table| / (J mol⁻¹ K⁻¹) and where */
    readonly maxAbsolute: number;
    readonly maxAbsoluteAt: number;
    /** max |Cp,fit − Cp,table| / Cp,table */
    readonly maxRelative: number;
    /** root-mean-square Cp residual / (J mol⁻¹ K⁻¹) */
    readonly rms: number;
  };
}

/** Scaled variable τ = T/θ keeps the polynomial columns of comparable size. */
const THETA = 1000;

/**
 * Least-squares fit of a two-range NASA-7 set to tabulated Cp, continuous in Cp, H and S at
 * the joint and anchored so that H(298.15 K) = ΔfH° and S(298.15 K) = S° exactly.
 *
 * Method: Cp/R in each range is a quartic in τ = T/1000 (b₁…b₅ low, c₁…c₅ high). Continuity
 * of Cp at the joint is the one linear constraint on these ten; it is eliminated by solving
 * for c₁, leaving an unconstrained least-squares problem in nine unknowns, solved by
 * Householder QR. The enthalpy and entropy constants then follow exactly: a₆, a₇ of the low
 * range from the 298.15 K anchors, those of the high range from continuity of H and S at the
 * joint. Residuals are unweighted Cp residuals.
 *
 * @throws ThermoInputError when 298.15 K is not in the low range, or a range has < 6 points
 */
export function fitNasa7TwoRange(input: Nasa7FitInput): Nasa7FitResult {
  const { points, tMid, formationEnthalpy, entropy } = input;
  const rGas = input.gasConstant ?? R;
  if (points.length === 0) throw new ThermoInputError('points', 'no points to fit');
  const sorted = [...points].sort((p, q) => p.temperature - q.temperature);
  const tMin = sorted[0].temperature;
  const tMax = sorted[sorted.length - 1].temperature;
  if (!(tMin <= T_REF && T_REF < tMid && tMid < tMax)) {
    throw new ThermoInputError('tMid', `need ${tMin} K ≤ 298.15 K < tMid = ${tMid} K < ${tMax} K`);
  }
  const low = sorted.filter((p) => p.temperature <= tMid);
  const high = sorted.filter((p) => p.temperature > tMid);
  if (low.length < 6 || high.length < 6) {
    throw new ThermoInputError('points', `need at least 6 points on each side of ${tMid} K (have ${low.length} and ${high.length})`);
  }
  sorted.forEach((p, i) => {
    if (!(Number.isFinite(p.cp) && p.cp > 0)) throw new ThermoInputError(`points[${i}]`, `Cp must be positive, got ${p.cp}`);
  });

  const tauMid = tMid / THETA;
  const powers = (tau: number) => [1, tau, tau ** 2, tau ** 3, tau ** 4];
  const mid = powers(tauMid);
  // Unknowns: b1..b5 (low), c2..c5 (high); c1 = Σ b_k·τm^(k−1) − Σ_{k≥2} c_k·τm^(k−1).
  const design = sorted.map((p) => {
    const tau = p.temperature / THETA;
    const pw = powers(tau);
    return p.temperature <= tMid ? [...pw, 0, 0, 0, 0] : [...mid, ...pw.slice(1).map((v, k) => v - mid[k + 1])];
  });
  const target = sorted.map((p) => p.cp / rGas);
  const { x } = leastSquares(design, target);
  const b = x.slice(0, 5);
  const cRest = x.slice(5);
  const c1 = b.reduce((s, bk, k) => s + bk * mid[k], 0) - cRest.reduce((s, ck, k) => s + ck * mid[k + 1], 0);
  const c = [c1, ...cRest];
  const unscale = (v: number[]) => v.map((coef, k) => coef / THETA ** k);
  const aLow = unscale(b);
  const aHigh = unscale(c);

  const t = T_REF;
  const hPoly = (a: number[], T: number) => a[0] * T + (a[1] * T ** 2) / 2 + (a[2] * T ** 3) / 3 + (a[3] * T ** 4) / 4 + (a[4] * T ** 5) / 5;
  const sPoly = (a: number[], T: number) => a[0] * Math.log(T) + a[1] * T + (a[2] * T ** 2) / 2 + (a[3] * T ** 3) / 3 + (a[4] * T ** 4) / 4;
  const a6Low = formationEnthalpy / rGas - hPoly(aLow, t);
  const a7Low = entropy / rGas - sPoly(aLow, t);
  const a6High = hPoly(aLow, tMid) + a6Low - hPoly(aHigh, tMid);
  const a7High = sPoly(aLow, tMid) + a7Low - sPoly(aHigh, tMid);

  const fit: Nasa7Function = {
    kind: 'nasa7',
    gasConstant: input.gasConstant,
    ranges: [
      { tMin, tMax: tMid, coefficients: [...aLow, a6Low, a7Low] },
      { tMin: tMid, tMax, coefficients: [...aHigh, a6High, a7High] },
    ],
  };
  let maxAbsolute = 0, maxAbsoluteAt = tMin, maxRelative = 0, sumSquares = 0;
  for (const p of sorted) {
    const range = p.temperature <= tMid ? fit.ranges[0] : fit.ranges[1];
    const residual = nasa7RangeAt(range, p.temperature, rGas).cp - p.cp;
    sumSquares += residual * residual;
    if (Math.abs(residual) > maxAbsolute) {
      maxAbsolute = Math.abs(residual);
      maxAbsoluteAt = p.temperature;
    }
    maxRelative = Math.max(maxRelative, Math.abs(residual) / p.cp);
  }
  return { fit, residuals: { maxAbsolute, maxAbsoluteAt, maxRelative, rms: Math.sqrt(sumSquares / sorted.length) } };
}
