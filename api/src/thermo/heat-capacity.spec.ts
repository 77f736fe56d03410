import fc from 'fast-check';
import { R } from './constants';
import { OutOfRangeError, ThermoInputError } from './errors';
import {
  compileHeatCapacity,
  evaluateHeatCapacity,
  intrinsicReferenceValues,
  validRange,
  type HeatCapacityFunction,
} from './heat-capacity';
import { expectWithin } from './testing/expect-within';
import { NBS_1982, TM4513, TP2002_N2, WEBBOOK_SHOMATE } from './testing/published-values';
import { expectProperty } from './testing/expect-property';

describe('heat-capacity functions', () => {
  describe('valid range', () => {
    it('refuses to extrapolate by default and names T and the range', () => {
      // NASA TM-4513: the N2 set is valid 200–6000 K
      expect(() => evaluateHeatCapacity(TM4513.N2, 150, { subject: 'N2(g)' })).toThrowMatching(
        (e) => e instanceof OutOfRangeError && e.temperature === 150 && e.tMin === 200 && e.tMax === 6000 && /N2\(g\)/.test(e.message),
      );
      expect(() => evaluateHeatCapacity(TM4513.N2, 6500)).toThrowError(OutOfRangeError);
    });

    it('extrapolates when asked and flags the result', () => {
      const p = evaluateHeatCapacity(TM4513.N2, 150, { extrapolate: true });
      expect(p.extrapolated).toBeTrue();
      expect(Number.isFinite(p.cp)).toBeTrue();
    });

    it('rejects temperatures that are not positive numbers', () => {
      for (const t of [0, -5, Number.NaN, Number.POSITIVE_INFINITY]) {
        expect(() => evaluateHeatCapacity(TM4513.N2, t)).withContext(String(t)).toThrowError(ThermoInputError);
      }
    });

    it('rejects malformed fits with the field at fault', () => {
      expect(() => compileHeatCapacity({ kind: 'nasa7', ranges: [{ tMin: 200, tMax: 1000, coefficients: [1, 2, 3] }] }))
        .toThrowMatching((e) => e instanceof ThermoInputError && e.field === 'nasa7.ranges[0].coefficients');
      expect(() => compileHeatCapacity({ kind: 'nasa7', ranges: [] })).toThrowError(ThermoInputError);
      expect(() => compileHeatCapacity({
        kind: 'nasa7',
        ranges: [
          { tMin: 200, tMax: 1000, coefficients: TM4513.N2.ranges[0].coefficients },
          { tMin: 900, tMax: 6000, coefficients: TM4513.N2.ranges[1].coefficients },
        ],
      })).toThrowMatching((e) => e instanceof ThermoInputError && /overlaps/.test(e.message));
    });
  });

  describe('dispatch over the forms', () => {
    // Valid ranges as published: TM-4513 200–6000 K, TP-2002 N2 200–20000 K, WebBook N2
    // Shomate 100–6000 K, WebBook H2O Shomate 500–6000 K.
    const ranges: Array<[string, HeatCapacityFunction, number, number]> = [
      ['NASA-7 N2', TM4513.N2, 200, 6000],
      ['NASA-9 N2', TP2002_N2, 200, 20000],
      ['Shomate N2', WEBBOOK_SHOMATE.N2, 100, 6000],
      ['Shomate H2O', WEBBOOK_SHOMATE.H2O, 500, 6000],
    ];
    for (const [name, fn, tMin, tMax] of ranges) {
      it(`knows the valid range of ${name}: ${tMin}–${tMax} K`, () => {
        expect(validRange(fn)).toEqual({ tMin, tMax });
      });
    }

    it('reports the 298.15 K constants a fit carries, and none for anchored forms', () => {
      // WebBook H2O Shomate: H = −241.8264 kJ/mol is ΔfH°(298.15 K)
      expectWithin(intrinsicReferenceValues(WEBBOOK_SHOMATE.H2O)!.formationEnthalpy, -241826.4, 1e-6, 'Shomate H');
      expect(intrinsicReferenceValues({ kind: 'constant', cp: NBS_1982['H2O(l)'].cp, tMin: 273.15, tMax: 373.15 })).toBeNull();
    });

    it('compiles each function once and reuses the kernel', () => {
      expect(compileHeatCapacity(TM4513.N2)).toBe(compileHeatCapacity(TM4513.N2));
    });
  });

  describe('Gibbs–Helmholtz: d(G/T)/dT = −H/T² for every form (property)', () => {
    // Thermodynamic identity; G = H − T·S with H = H(T) − H(298.15) and the forms' own S.
    const forms: Array<[string, HeatCapacityFunction, number, number]> = [
      ['NASA-7 N2', TM4513.N2, 210, 5900],
      ['NASA-9 N2', TP2002_N2, 210, 19000],
      ['Shomate N2', WEBBOOK_SHOMATE.N2, 110, 5900],
      ['constant H2O(l)', { kind: 'constant', cp: 75.291, tMin: 273.15, tMax: 373.15 }, 275, 370],
      ['tabulated N2', { kind: 'tabulated', points: [200, 298.15, 500, 1000, 3000].map((t) => ({ temperature: t, cp: evaluateHeatCapacity(TM4513.N2, t).cp })) }, 205, 2900],
    ];
    for (const [name, fn, lo, hi] of forms) {
      it(name, () => {
        const joints = 'ranges' in fn ? fn.ranges.slice(1).map((r) => r.tMin) : [];
        const gOverT = (t: number) => {
          const p = evaluateHeatCapacity(fn, t, { s298: 191.609 });
          return (p.enthalpyIncrement - t * p.entropy) / t;
        };
        expectProperty(
          fc.property(fc.double({ min: lo, max: hi, noNaN: true }), (t) => {
            const h = 1e-3 * t;
            // The identity holds inside each range; a difference across a joint would mix two fits.
            if (joints.some((j) => Math.abs(t - j) <= h)) return true;
            const derivative = (gOverT(t + h) - gOverT(t - h)) / (2 * h);
            const hOverT2 = evaluateHeatCapacity(fn, t, { s298: 191.609 }).enthalpyIncrement / (t * t);
            return Math.abs(derivative + hOverT2) <= 1e-6 * Math.max(1, Math.abs(hOverT2)) + 1e-7;
          }),
          { numRuns: 200 },
        );
      });
    }

    it('dH/dT = Cp and dS/dT = Cp/T for NASA-7 H2O (property)', () => {
      expectProperty(
        fc.property(fc.double({ min: 210, max: 5900, noNaN: true }), (t) => {
          const h = 1e-3;
          const up = evaluateHeatCapacity(TM4513.H2O, t + h);
          const down = evaluateHeatCapacity(TM4513.H2O, t - h);
          const mid = evaluateHeatCapacity(TM4513.H2O, t);
          if (Math.abs(t - 1000) < 2 * h) return true; // the joint: one-sided ranges
          return Math.abs((up.enthalpyIncrement - down.enthalpyIncrement) / (2 * h) - mid.cp) < 1e-4 * mid.cp &&
            Math.abs((up.entropy - down.entropy) / (2 * h) - mid.cp / t) < 1e-4 * (mid.cp / t);
        }),
        { numRuns: 200 },
      );
    });
  });

  it('uses R = 8.314462618 J/(mol·K) for NASA forms unless the set states its own', () => {
    // CODATA 2018: R exact; Cp of the monatomic H set (a1 = 2.5) is 5/2·R
    expect(evaluateHeatCapacity(TM4513.H, 500).cp).toBe(2.5 * R);
    const older = { ...TM4513.H, gasConstant: 8.31451 };
    expect(evaluateHeatCapacity(older, 500).cp).toBe(2.5 * 8.31451);
  });
});
