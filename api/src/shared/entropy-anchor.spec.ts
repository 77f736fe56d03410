import { anchorFitEntropy } from './entropy-anchor';
import { evaluateHeatCapacity, type HeatCapacityFunction } from '../thermo';

// NASA TM-4513 (McBride, Gordon & Reno 1993), H2O(g), 200–1000–6000 K, as in shared/reference-data.
const H2O_NASA7: HeatCapacityFunction = {
  kind: 'nasa7',
  ranges: [
    { tMin: 200, tMax: 1000, coefficients: [4.19864056, -2.0364341e-3, 6.52040211e-6, -5.48797062e-9, 1.77197817e-12, -30293.7267, -0.849032208] },
    { tMin: 1000, tMax: 6000, coefficients: [2.67703787, 2.97318329e-3, -7.7376969e-7, 9.44336689e-11, -4.26900959e-15, -29885.8938, 6.88255571] },
  ],
};

describe('anchoring a fit to the recommended S°', () => {
  // CODATA Key Values (1989): S°(H2O, g, 298.15 K) = 188.835 J/(mol·K).
  const CODATA_S = 188.835;

  it('makes S(298.15 K) equal the recommended value and shifts S equally at every T, leaving Cp and H alone', () => {
    const { fn, shift } = anchorFitEntropy(H2O_NASA7, CODATA_S);
    const at = (f: HeatCapacityFunction, t: number) => evaluateHeatCapacity(f, t);
    expect(at(fn, 298.15).entropy).toBeCloseTo(CODATA_S, 9);
    // The TM-4513 set reproduces JANAF's 188.834 (Chase 1998), so the shift is a few thousandths.
    expect(Math.abs(shift)).toBeLessThan(0.02);
    for (const t of [300, 999.9, 1000, 1000.1, 3000]) {
      expect(at(fn, t).entropy - at(H2O_NASA7, t).entropy).toBeCloseTo(shift, 9);
      expect(at(fn, t).cp).toBe(at(H2O_NASA7, t).cp);
      expect(at(fn, t).enthalpyIncrement).toBeCloseTo(at(H2O_NASA7, t).enthalpyIncrement, 9);
    }
  });

  it('returns the same object for the same fit and value (so the engine compiles it once)', () => {
    expect(anchorFitEntropy(H2O_NASA7, CODATA_S).fn).toBe(anchorFitEntropy(H2O_NASA7, CODATA_S).fn);
  });
});
