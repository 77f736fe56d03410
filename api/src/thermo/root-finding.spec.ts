import { brentRoot } from './root-finding';

describe('brentRoot', () => {
  // Mathematical test functions with known roots (no published data involved).
  it('finds √2 as the root of x² − 2 on [0, 2]', () => {
    expect(Math.abs(brentRoot((x) => x * x - 2, 0, 2, 1e-12)! - Math.SQRT2)).toBeLessThan(1e-11);
  });

  it('finds the root of cos x − x (0.7390851332…) in few evaluations', () => {
    let calls = 0;
    const root = brentRoot((x) => { calls++; return Math.cos(x) - x; }, 0, 1, 1e-12)!;
    expect(Math.abs(root - 0.7390851332151607)).toBeLessThan(1e-11);
    expect(calls).toBeLessThan(20);
  });

  it('returns null when the interval does not bracket a root, and an end point that is a root', () => {
    expect(brentRoot((x) => x * x + 1, -1, 1)).toBeNull();
    expect(brentRoot((x) => x - 1, 1, 3)).toBe(1);
  });
});
