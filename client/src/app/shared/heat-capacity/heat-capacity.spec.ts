import { GAS_CONSTANT, heatCapacityAt, heatCapacityCurve } from './heat-capacity';

// Mathematical identities of each form (not data): a curve made of known terms must give them back.
describe('heatCapacityAt', () => {
  it('gives a constant Cp° inside its range and nothing outside', () => {
    const ranges = [{ tMin: 298.15, tMax: 500, coefficients: [75.3] }];
    expect(heatCapacityAt('constant', ranges, 400)).toBe(75.3);
    expect(heatCapacityAt('constant', ranges, 600)).toBeNull();
  });

  it('evaluates the Shomate form in t = T/1000 K', () => {
    const ranges = [{ tMin: 300, tMax: 1200, coefficients: [30, 6, 0, 0, 0.5, 0, 0, 0] }];
    // At 1000 K, t = 1: Cp = A + B + E = 36.5
    expect(heatCapacityAt('shomate', ranges, 1000)).toBeCloseTo(36.5, 10);
    // At 500 K, t = 0.5: Cp = 30 + 3 + 0.5 / 0.25 = 35
    expect(heatCapacityAt('shomate', ranges, 500)).toBeCloseTo(35, 10);
  });

  it('evaluates the NASA 7 form as Cp/R and picks the range holding T', () => {
    const ranges = [
      { tMin: 200, tMax: 1000, coefficients: [3.5, 0, 0, 0, 0, 0, 0] },
      { tMin: 1000, tMax: 6000, coefficients: [3, 1e-3, 0, 0, 0, 0, 0] },
    ];
    expect(heatCapacityAt('nasa7', ranges, 500)).toBeCloseTo(3.5 * GAS_CONSTANT, 10);
    expect(heatCapacityAt('nasa7', ranges, 2000)).toBeCloseTo(5 * GAS_CONSTANT, 10);
  });

  it('evaluates the NASA 9 form with its inverse powers of T', () => {
    const ranges = [{ tMin: 200, tMax: 1000, coefficients: [40000, 200, 2.5, 0, 0, 0, 0, 0, 0] }];
    // At 200 K: 40000/200² + 200/200 + 2.5 = 1 + 1 + 2.5 = 4.5 (Cp/R)
    expect(heatCapacityAt('nasa9', ranges, 200)).toBeCloseTo(4.5 * GAS_CONSTANT, 10);
  });

  it('interpolates tabulated points along straight lines', () => {
    const ranges = [{ tMin: 280, tMax: 340, points: [[280, 140], [300, 144], [340, 150]] as [number, number][] }];
    expect(heatCapacityAt('tabulated', ranges, 290)).toBeCloseTo(142, 10);
    expect(heatCapacityAt('tabulated', ranges, 320)).toBeCloseTo(147, 10);
  });

  it('gives nothing for a range whose coefficients are incomplete', () => {
    expect(heatCapacityAt('shomate', [{ tMin: 300, tMax: 1000, coefficients: [1, 2] }], 500)).toBeNull();
  });
});

describe('heatCapacityCurve', () => {
  it('covers every range from the lowest to the highest temperature, with each joint', () => {
    const curve = heatCapacityCurve(
      'constant',
      [
        { tMin: 300, tMax: 700, coefficients: [30] },
        { tMin: 700, tMax: 1300, coefficients: [35] },
      ],
      10,
    );
    expect(curve[0]).toEqual({ x: 300, y: 30 });
    expect(curve.at(-1)).toEqual({ x: 1300, y: 35 });
    expect(curve.some((point) => point.x === 700)).toBeTrue();
  });

  it('is empty without a temperature interval', () => {
    expect(heatCapacityCurve('constant', [])).toEqual([]);
  });
});
