import { OutOfRangeError } from './errors';
import { evaluateHeatCapacity } from './heat-capacity';
import { shomateRangeAt } from './shomate';
import { expectWithin } from './testing/expect-within';
import { JANAF, WEBBOOK_SHOMATE } from './testing/published-values';

describe('Shomate (NIST WebBook, from Chase 1998) against the JANAF rows', () => {
  const cases: Array<['N2' | 'H2O', number]> = [['N2', 298.15], ['N2', 1000], ['H2O', 1000]];
  for (const [species, t] of cases) {
    it(`reproduces JANAF ${species}(g) at ${t} K`, () => {
      // NIST-JANAF Thermochemical Tables, 4th ed. (Chase 1998); the WebBook fits agree to
      // 0.006 J/(mol·K) in Cp and S and 0.003 kJ/mol in H−H298.
      const row = JANAF[species][t];
      const p = evaluateHeatCapacity(WEBBOOK_SHOMATE[species], t);
      expectWithin(p.cp, row.cp, 0.006, 'Cp');
      expectWithin(p.entropy, row.s, 0.006, 'S');
      expectWithin(p.enthalpyIncrement / 1000, row.dh, 0.003, 'H−H298 / kJ');
    });
  }

  it('refuses 298.15 K for the H2O fit, valid only from 500 K, unless asked to extrapolate', () => {
    // NIST WebBook: the H2O(g) Shomate fit is stated for 500–1700 K and 1700–6000 K
    expect(() => evaluateHeatCapacity(WEBBOOK_SHOMATE.H2O, 298.15)).toThrowMatching(
      (e) => e instanceof OutOfRangeError && e.temperature === 298.15 && e.tMin === 500 && e.tMax === 6000,
    );
    const p = evaluateHeatCapacity(WEBBOOK_SHOMATE.H2O, 298.15, { extrapolate: true });
    expect(p.extrapolated).toBeTrue();
    // JANAF S°(H2O, g, 298.15 K) = 188.834: the extrapolated fit is still within 0.01
    expectWithin(p.entropy, 188.834, 0.01, 'extrapolated S');
  });

  it('gives H − H298 ≈ 0 at 298.15 K through its F and H constants (WebBook N2, 100–500 K range)', () => {
    // NIST WebBook N2 Shomate: F = −8.671914, H = 0 kJ/mol make H(298.15) − H298 vanish to 0.1 J/mol
    expectWithin(shomateRangeAt(WEBBOOK_SHOMATE.N2.ranges[0], 298.15).enthalpyIncrement, 0, 0.1, 'H − H298 / J');
  });
});
