import { ThermoInputError } from './errors';
import { findRange, rangeIndexOrNearest, validateCoefficients, validateRanges } from './thermo-kernel';

describe('temperature ranges', () => {
  // The NASA convention (TM-4513): at a joint the lower range applies. Ranges here are those
  // of the TM-4513 sets (200–1000–6000 K) and of the WebBook H2O Shomate fit (500–1700–6000 K).
  const nasa = [{ tMin: 200, tMax: 1000 }, { tMin: 1000, tMax: 6000 }];
  const table: Array<[number, number]> = [[200, 0], [999.9, 0], [1000, 0], [1000.1, 1], [6000, 1], [150, -1], [7000, -2]];
  for (const [t, expected] of table) {
    it(`finds the range of ${t} K: ${expected}`, () => {
      expect(findRange(nasa, t)).toBe(expected);
    });
  }

  it('picks the nearest range across a gap for extrapolation', () => {
    const gapped = [{ tMin: 200, tMax: 500 }, { tMin: 1700, tMax: 6000 }];
    expect(rangeIndexOrNearest(findRange(gapped, 600))).toBe(0);
    expect(rangeIndexOrNearest(findRange(gapped, 1600))).toBe(1);
    expect(findRange(gapped, 1600)).toBeLessThan(0);
  });

  it('validates ranges and coefficient lists, naming the field', () => {
    expect(() => validateRanges([], 'r')).toThrowMatching((e) => e instanceof ThermoInputError && e.field === 'r');
    expect(() => validateRanges([{ tMin: 500, tMax: 400 }], 'r')).toThrowMatching((e) => e instanceof ThermoInputError && e.field === 'r[0]');
    expect(() => validateRanges([{ tMin: 500, tMax: 1700 }, { tMin: 1700, tMax: 6000 }], 'r')).not.toThrow();
    expect(() => validateCoefficients([1, Number.NaN], 2, 'c')).toThrowMatching((e) => e instanceof ThermoInputError && e.field === 'c[1]');
  });
});
