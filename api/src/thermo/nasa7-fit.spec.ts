import { ThermoInputError } from './errors';
import { evaluateHeatCapacity } from './heat-capacity';
import { fitNasa7TwoRange } from './nasa7-fit';
import { nasa7RangeAt } from './nasa7';
import { expectWithin } from './testing/expect-within';
import { JANAF, TM4513 } from './testing/published-values';

describe('fitNasa7TwoRange', () => {
  // Cp points generated from the published NASA TM-4513 N2 set (200–1000–6000 K), every 25 K;
  // the fit is anchored to JANAF ΔfH°(N2) = 0 and S°(298.15 K) = 191.609 J/(mol·K)
  // (NIST-JANAF 4th ed., Chase 1998).
  const points = Array.from({ length: (6000 - 200) / 25 + 1 }, (_, i) => 200 + 25 * i).map((t) => ({
    temperature: t,
    cp: evaluateHeatCapacity(TM4513.N2, t).cp,
  }));
  const result = fitNasa7TwoRange({ points, tMid: 1000, formationEnthalpy: 0, entropy: JANAF['N2'][298.15].s });

  it('recovers Cp within 0.05 % at every point and reports the residuals', () => {
    expect(result.residuals.maxRelative).toBeLessThan(5e-4);
    expect(result.residuals.rms).toBeLessThanOrEqual(result.residuals.maxAbsolute);
    for (const t of [200, 298.15, 777, 1000, 1500, 3333, 6000]) {
      const fitted = evaluateHeatCapacity(result.fit, t).cp;
      const source = evaluateHeatCapacity(TM4513.N2, t).cp;
      expect(Math.abs(fitted - source) / source).withContext(`${t} K`).toBeLessThan(5e-4);
    }
  });

  it('reproduces H(298.15 K) = ΔfH° and S(298.15 K) = S° exactly (anchors)', () => {
    const low = result.fit.ranges[0];
    const at298 = nasa7RangeAt(low, 298.15);
    expectWithin(at298.enthalpy, 0, 1e-9, 'H(298.15 K) / J');
    expectWithin(at298.entropy, 191.609, 1e-10, 'S(298.15 K)');
  });

  it('is continuous in Cp, H and S at the 1000 K joint', () => {
    const below = nasa7RangeAt(result.fit.ranges[0], 1000);
    const above = nasa7RangeAt(result.fit.ranges[1], 1000);
    expectWithin(above.cp, below.cp, 1e-9, 'Cp');
    expectWithin(above.enthalpy, below.enthalpy, 1e-6, 'H / J');
    expectWithin(above.entropy, below.entropy, 1e-9, 'S');
  });

  it('still reproduces the JANAF N2 row at 1000 K to the TM-4513 tolerance', () => {
    // NIST-JANAF 4th ed.: N2(g), 1000 K: Cp° 32.697, S° 228.170, H°−H°298 21.463 kJ/mol
    const p = evaluateHeatCapacity(result.fit, 1000);
    expectWithin(p.cp, 32.697, 0.0015 * 32.697, 'Cp');
    expectWithin(p.entropy, 228.17, 0.025, 'S');
    expectWithin(p.enthalpyIncrement / 1000, 21.463, 0.01, 'H−H298 / kJ');
  });

  it('refuses a joint that leaves too few points or 298.15 K outside the low range', () => {
    expect(() => fitNasa7TwoRange({ points: points.slice(0, 30), tMid: 900, formationEnthalpy: 0, entropy: 191.609 }))
      .toThrowMatching((e) => e instanceof ThermoInputError && /at least 6 points/.test(e.message));
    expect(() => fitNasa7TwoRange({ points, tMid: 250, formationEnthalpy: 0, entropy: 191.609 }))
      .toThrowMatching((e) => e instanceof ThermoInputError && e.field === 'tMid');
  });
});
