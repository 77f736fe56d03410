import { ThermoInputError } from './errors';
import { compileHeatCapacity, evaluateHeatCapacity, type HeatCapacityFunction } from './heat-capacity';
import { expectWithin } from './testing/expect-within';
import { JANAF, NBS_1982 } from './testing/published-values';

describe('constant Cp', () => {
  // NBS 1982: Cp°(H2O, l) = 75.291 J/(mol·K) (from memory; JANAF prints 75.351, a 0.08 %
  // difference), S° = 69.91 J/(mol·K).
  const water: HeatCapacityFunction = { kind: 'constant', cp: NBS_1982['H2O(l)'].cp, tMin: 273.15, tMax: 373.15 };

  it('gives H − H298 = Cp·(T − 298.15) and S = S298 + Cp·ln(T/298.15)', () => {
    const p = evaluateHeatCapacity(water, 350, { s298: 69.91 });
    expectWithin(p.enthalpyIncrement, 75.291 * (350 - 298.15), 1e-9, 'H−H298');
    expectWithin(p.entropy, 69.91 + 75.291 * Math.log(350 / 298.15), 1e-12, 'S');
    expectWithin(p.cp, 75.291, 0, 'Cp');
  });

  it('agrees with the JANAF Cp° of liquid water at 298.15 K within the 0.08 % the tables differ', () => {
    // NIST-JANAF 4th ed.: Cp°(H2O, l, 298.15 K) = 75.351 J/(mol·K)
    expectWithin(evaluateHeatCapacity(water, 298.15, { s298: 69.91 }).cp, JANAF['H2O(l)'][298.15].cp, 0.0008 * 75.351, 'Cp');
  });

  it('needs S°(298.15) from the species data', () => {
    expect(() => evaluateHeatCapacity(water, 300)).toThrowMatching((e) => e instanceof ThermoInputError && e.field === 's298');
  });

  it('refuses negative Cp', () => {
    expect(() => compileHeatCapacity({ kind: 'constant', cp: -1, tMin: 200, tMax: 300 }, 1)).toThrowError(ThermoInputError);
  });
});
