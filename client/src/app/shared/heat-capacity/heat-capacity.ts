import { FitForm } from '../vocabulary/thermo-vocabulary';

/** Molar gas constant, J/(mol·K) (CODATA 2018, exact since the 2019 SI). */
export const GAS_CONSTANT = 8.314462618;

/** One range of a fit as entered: coefficients, or [T / K, Cp / (J/(mol·K))] points for a table. */
export interface FitRangeInput {
  readonly tMin: number;
  readonly tMax: number;
  readonly coefficients?: readonly number[];
  readonly points?: readonly (readonly [number, number])[];
}

/**
 * Cp°(T) / (J/(mol·K)) of a heat-capacity fit at `temperature` K, or null outside its ranges
 * or where the range's numbers are incomplete. Forms as stored (api/src/values/fit-ranges.ts):
 * - constant: [Cp]
 * - shomate: Cp = A + B·t + C·t² + D·t³ + E/t², t = T / 1000 K
 * - nasa7: Cp/R = a1 + a2·T + a3·T² + a4·T³ + a5·T⁴
 * - nasa9: Cp/R = a1·T⁻² + a2·T⁻¹ + a3 + a4·T + a5·T² + a6·T³ + a7·T⁴
 * - tabulated: straight lines between the points
 */
export function heatCapacityAt(form: FitForm, ranges: readonly FitRangeInput[], temperature: number): number | null {
  const range = ranges.find((r) => temperature >= r.tMin && temperature <= r.tMax);
  if (!range) {
    return null;
  }
  const c = range.coefficients ?? [];
  const T = temperature;
  switch (form) {
    case 'constant':
      return c.length >= 1 ? c[0] : null;
    case 'shomate': {
      if (c.length < 5) {
        return null;
      }
      const t = T / 1000;
      return c[0] + c[1] * t + c[2] * t ** 2 + c[3] * t ** 3 + c[4] / t ** 2;
    }
    case 'nasa7':
      return c.length < 5 ? null : GAS_CONSTANT * (c[0] + c[1] * T + c[2] * T ** 2 + c[3] * T ** 3 + c[4] * T ** 4);
    case 'nasa9':
      return c.length < 7
        ? null
        : GAS_CONSTANT * (c[0] / T ** 2 + c[1] / T + c[2] + c[3] * T + c[4] * T ** 2 + c[5] * T ** 3 + c[6] * T ** 4);
    case 'tabulated':
      return interpolate(range.points ?? [], T);
  }
}

function interpolate(points: readonly (readonly [number, number])[], T: number): number | null {
  for (let i = 1; i < points.length; i++) {
    const [t0, cp0] = points[i - 1];
    const [t1, cp1] = points[i];
    if (T >= t0 && T <= t1 && t1 > t0) {
      return cp0 + ((cp1 - cp0) * (T - t0)) / (t1 - t0);
    }
  }
  return points.length === 1 && points[0][0] === T ? points[0][1] : null;
}

/**
 * Points of the curve over all ranges, about `count` of them evenly spaced and each range's ends,
 * for a plot. Empty when the ranges do not span a temperature interval.
 */
export function heatCapacityCurve(form: FitForm, ranges: readonly FitRangeInput[], count = 80): { x: number; y: number | null }[] {
  if (ranges.length === 0) {
    return [];
  }
  const tMin = Math.min(...ranges.map((r) => r.tMin));
  const tMax = Math.max(...ranges.map((r) => r.tMax));
  if (!(tMax > tMin)) {
    return [];
  }
  const temperatures = new Set<number>();
  for (let i = 0; i <= count; i++) {
    temperatures.add(round(tMin + ((tMax - tMin) * i) / count));
  }
  for (const range of ranges) {
    temperatures.add(range.tMin);
    temperatures.add(range.tMax);
  }
  return [...temperatures].sort((a, b) => a - b).map((x) => ({ x, y: heatCapacityAt(form, ranges, x) }));
}

function round(kelvin: number): number {
  return Math.round(kelvin * 100) / 100;
}
