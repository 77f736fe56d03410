import { ThermoInputError } from './errors';
import { compileHeatCapacity, evaluateHeatCapacity, type HeatCapacityFunction } from './heat-capacity';
import { expectWithin } from './testing/expect-within';
import { JANAF, TM4513 } from './testing/published-values';

describe('tabulated Cp (piecewise-linear, integrated exactly)', () => {
  // Cp points generated from the TM-4513 N2 set every 10 K; the integrals of the
  // piecewise-linear interpolant must match the set's own H and S (which JANAF confirms)
  // to the interpolation error, below 0.002 kJ/mol and 0.001 J/(mol·K) at this spacing.
  const points = Array.from({ length: 181 }, (_, i) => 200 + 10 * i).map((t) => ({
    temperature: t,
    cp: evaluateHeatCapacity(TM4513.N2, t).cp,
  }));
  const table: HeatCapacityFunction = { kind: 'tabulated', points };
  const s298 = evaluateHeatCapacity(TM4513.N2, 298.15).entropy;

  for (const t of [298.15, 455, 1000, 1990]) {
    it(`matches the N2 polynomial it was sampled from at ${t} K`, () => {
      const exact = evaluateHeatCapacity(TM4513.N2, t);
      const p = evaluateHeatCapacity(table, t, { s298 });
      expectWithin(p.enthalpyIncrement, exact.enthalpyIncrement, 2, 'H−H298 / J');
      expectWithin(p.entropy, exact.entropy, 0.001, 'S');
      expectWithin(p.cp, exact.cp, 0.002, 'Cp');
    });
  }

  it('reproduces JANAF N2(g) at 1000 K to the tolerance of the polynomial it came from', () => {
    // NIST-JANAF 4th ed.: N2(g), 1000 K: S° = 228.170, H°−H°298 = 21.463 kJ/mol
    const p = evaluateHeatCapacity(table, 1000, { s298: JANAF['N2'][298.15].s });
    expectWithin(p.entropy, 228.17, 0.025, 'S');
    expectWithin(p.enthalpyIncrement / 1000, 21.463, 0.01, 'H−H298 / kJ');
  });

  it('is exact for a constant Cp table (NBS 1982 H2O(l) Cp°)', () => {
    const flat: HeatCapacityFunction = {
      kind: 'tabulated',
      points: [{ temperature: 273.15, cp: 75.291 }, { temperature: 300, cp: 75.291 }, { temperature: 373.15, cp: 75.291 }],
    };
    const p = evaluateHeatCapacity(flat, 350, { s298: 69.91 });
    expectWithin(p.enthalpyIncrement, 75.291 * (350 - 298.15), 1e-9, 'H−H298');
    expectWithin(p.entropy, 69.91 + 75.291 * Math.log(350 / 298.15), 1e-12, 'S');
  });

  it('rejects tables that do not span 298.15 K or do not increase', () => {
    expect(() => compileHeatCapacity({ kind: 'tabulated', points: [{ temperature: 300, cp: 29 }, { temperature: 400, cp: 29.2 }] }, 1))
      .toThrowMatching((e) => e instanceof ThermoInputError && /span 298.15 K/.test(e.message));
    expect(() => compileHeatCapacity({ kind: 'tabulated', points: [{ temperature: 200, cp: 29 }, { temperature: 200, cp: 29.2 }, { temperature: 400, cp: 29.2 }] }, 1))
      .toThrowMatching((e) => e instanceof ThermoInputError && /increase/.test(e.message));
  });
});
