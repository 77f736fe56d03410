import type { HeatCapacityFunction } from '../thermo/heat-capacity';
import type { FitRange } from '../values/fit-ranges';
import type { FitForm } from '../values/value-vocabulary';

/**
 * A stored heat-capacity fit (`heat_capacity_fits.form` + `ranges`, see values/fit-ranges.ts) as
 * the engine's function, or undefined when the form cannot be expressed (a constant Cp split over
 * several ranges). The ranges must already be valid (fitRangeProblems).
 */
export function heatCapacityFunction(form: FitForm, ranges: FitRange[]): HeatCapacityFunction | undefined {
  const coefficients = (r: FitRange) => ('coefficients' in r ? r.coefficients : []);
  switch (form) {
    case 'constant':
      if (ranges.length !== 1) return undefined;
      return { kind: 'constant', cp: coefficients(ranges[0])[0], tMin: ranges[0].tMin, tMax: ranges[0].tMax };
    case 'shomate':
      return {
        kind: 'shomate',
        ranges: ranges.map((r) => {
          const [A, B, C, D, E, F, G, H] = coefficients(r);
          return { tMin: r.tMin, tMax: r.tMax, A, B, C, D, E, F, G, H };
        }),
      };
    case 'nasa7':
      return { kind: 'nasa7', ranges: ranges.map((r) => ({ tMin: r.tMin, tMax: r.tMax, coefficients: coefficients(r) })) };
    case 'nasa9':
      return {
        kind: 'nasa9',
        ranges: ranges.map((r) => {
          const c = coefficients(r);
          return { tMin: r.tMin, tMax: r.tMax, coefficients: c.slice(0, 7), b1: c[7], b2: c[8] };
        }),
      };
    case 'tabulated': {
      const points: { temperature: number; cp: number }[] = [];
      for (const r of ranges) {
        for (const [temperature, cp] of 'points' in r ? r.points : []) {
          if (points.length > 0 && points[points.length - 1].temperature === temperature) continue;
          points.push({ temperature, cp });
        }
      }
      return { kind: 'tabulated', points };
    }
  }
}
