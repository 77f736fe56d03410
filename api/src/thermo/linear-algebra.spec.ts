import { ThermoInputError } from './errors';
import { leastSquares, solveLinearSystem } from './linear-algebra';

describe('linear algebra', () => {
  // Exact small systems (mathematics; no published data involved).
  it('solves a 3×3 system that needs pivoting', () => {
    const x = solveLinearSystem([[0, 2, 1], [1, 1, 1], [2, 1, 0]], [5, 4, 4]);
    [1, 2, 1].forEach((v, i) => expect(Math.abs(x[i] - v)).toBeLessThan(1e-12));
  });

  it('refuses a singular system', () => {
    expect(() => solveLinearSystem([[1, 2], [2, 4]], [1, 2])).toThrowError(ThermoInputError);
  });

  it('recovers an exact quartic by least squares on badly scaled columns (T up to 6000)', () => {
    const coefficients = [3.5, -1.2e-4, -5e-7, 2.4e-9, -1.4e-12];
    const ts = Array.from({ length: 60 }, (_, i) => 200 + 100 * i);
    const a = ts.map((t) => [1, t, t ** 2, t ** 3, t ** 4]);
    const b = ts.map((t) => coefficients.reduce((s, c, k) => s + c * t ** k, 0));
    const { x, residuals } = leastSquares(a, b);
    x.forEach((v, k) => expect(Math.abs(v - coefficients[k])).toBeLessThan(1e-6 * Math.abs(coefficients[k])));
    expect(Math.max(...residuals.map(Math.abs))).toBeLessThan(1e-9);
  });

  it('refuses fewer rows than unknowns and rank deficiency', () => {
    expect(() => leastSquares([[1, 2]], [1])).toThrowError(ThermoInputError);
    expect(() => leastSquares([[1, 1], [1, 1], [1, 1]], [1, 2, 3])).toThrowError(ThermoInputError);
  });
});
