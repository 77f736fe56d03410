import { CELSIUS_ZERO, P_ATM, P_STD, R, T_REF } from './constants';
import { expectWithin } from './testing/expect-within';

describe('constants', () => {
  it('R = 8.314462618 J/(mol·K) (CODATA 2018, exact since the 2019 SI)', () => {
    // CODATA 2018: R = N_A·k = 6.02214076e23 × 1.380649e-23, both exact
    expect(R).toBe(8.314462618);
    expectWithin(6.02214076e23 * 1.380649e-23, R, 1e-9, 'N_A·k');
  });

  it('standard conditions: 298.15 K, p° = 1 bar = 100 kPa (IUPAC 1982), 1 atm = 101.325 kPa, 0 °C = 273.15 K', () => {
    // IUPAC, Pure Appl. Chem. 54, 1239 (1982): p° = 1 bar; 1 atm ≡ 101 325 Pa by definition
    expect(T_REF).toBe(298.15);
    expect(P_STD).toBe(100000);
    expect(P_ATM).toBe(101325);
    expect(CELSIUS_ZERO).toBe(273.15);
  });
});
