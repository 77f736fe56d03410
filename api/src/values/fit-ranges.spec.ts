import { fitRangeProblems } from './fit-ranges';

describe('heat-capacity fit ranges', () => {
  const seven = [1, 2, 3, 4, 5, 6, 7];

  it('accepts contiguous ranges with the right number of coefficients', () => {
    expect(fitRangeProblems('nasa7', 200, 6000, [{ tMin: 200, tMax: 1000, coefficients: seven }, { tMin: 1000, tMax: 6000, coefficients: seven }])).toEqual([]);
    expect(fitRangeProblems('constant', 250, 350, [{ tMin: 250, tMax: 350, coefficients: [75.3] }])).toEqual([]);
    expect(fitRangeProblems('shomate', 298, 1200, [{ tMin: 298, tMax: 1200, coefficients: [1, 2, 3, 4, 5, 6, 7, 8] }])).toEqual([]);
    expect(fitRangeProblems('nasa9', 200, 1000, [{ tMin: 200, tMax: 1000, coefficients: [...seven, 8, 9] }])).toEqual([]);
    expect(fitRangeProblems('tabulated', 280, 340, [{ tMin: 280, tMax: 340, points: [[280, 136.9], [340, 159.9]] }])).toEqual([]);
  });

  it('names each problem', () => {
    expect(fitRangeProblems('nasa7', 200, 6000, [{ tMin: 200, tMax: 1000, coefficients: seven }, { tMin: 1100, tMax: 6000, coefficients: seven }]))
      .toEqual(['range 2 starts at 1100 K, not where range 1 ended (1000 K)']);
    expect(fitRangeProblems('nasa7', 200, 6000, [{ tMin: 300, tMax: 6000, coefficients: [1] }]))
      .toEqual(["range 1 starts at 300 K, not at the fit's Tmin 200 K", 'range 1: nasa7 needs exactly 7 numeric coefficients']);
    expect(fitRangeProblems('nasa7', 200, 6000, [{ tMin: 200, tMax: 1000, coefficients: seven }]))
      .toEqual(["the last range ends at 1000 K, not at the fit's Tmax 6000 K"]);
    expect(fitRangeProblems('tabulated', 280, 340, [{ tMin: 280, tMax: 340, points: [[280, 136.9], [270, -1]] }]))
      .toEqual(['range 1, point 2: T = 270 K lies outside 280–340 K', 'range 1, point 2: temperatures must increase', 'range 1, point 2: Cp must be positive']);
    expect(fitRangeProblems('nasa7', 0, 100, 'not a list')).toEqual(['Tmin and Tmax must satisfy 0 K < Tmin < Tmax (got 0, 100)', 'ranges must be a non-empty list']);
  });
});
