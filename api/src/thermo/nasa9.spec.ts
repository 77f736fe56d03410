import { evaluateHeatCapacity, validRange } from './heat-capacity';
import { nasa9RangeAt } from './nasa9';
import { expectWithin } from './testing/expect-within';
import { JANAF, TP2002_N2 } from './testing/published-values';

describe('NASA-9 (TP-2002-211556) against the JANAF rows', () => {
  for (const t of [298.15, 1000]) {
    it(`reproduces JANAF N2(g) at ${t} K`, () => {
      // NIST-JANAF Thermochemical Tables, 4th ed. (Chase 1998): N2(g) row at t; the TP-2002
      // fit agrees to 0.002 J/(mol·K) and 0.002 kJ/mol (tolerances below).
      const row = JANAF['N2'][t];
      const p = evaluateHeatCapacity(TP2002_N2, t);
      expectWithin(p.cp, row.cp, 0.002, 'Cp');
      expectWithin(p.entropy, row.s, 0.002, 'S');
      expectWithin(p.gibbsEnergyFunction, row.gef, 0.002, '−(G−H298)/T');
      expectWithin(p.enthalpyIncrement / 1000, row.dh, 0.002, 'H−H298 / kJ');
    });
  }

  it('evaluates its third range (6000–20000 K) and joins the second continuously', () => {
    // NASA TP-2002-211556 N2 set: Cp continuous at 6000 K to 1e-4 J/(mol·K) (computed from the set)
    const below = evaluateHeatCapacity(TP2002_N2, 6000);
    const above = evaluateHeatCapacity(TP2002_N2, 6000.000001);
    expectWithin(above.cp, below.cp, 1e-4, 'Cp at 6000 K');
    expect(validRange(TP2002_N2)).toEqual({ tMin: 200, tMax: 20000 });
  });

  it('evaluates one range at the 1000 K joint consistently with its neighbour', () => {
    // NASA TP-2002-211556 N2: H continuous at 1000 K to 0.01 J/mol (computed from the set)
    const below = nasa9RangeAt(TP2002_N2.ranges[0], 1000);
    const above = nasa9RangeAt(TP2002_N2.ranges[1], 1000);
    expectWithin(above.enthalpy, below.enthalpy, 0.01, 'H / J');
  });
});
