import { parseFormula } from './formula';
import { ELECTRON_MOLAR_MASS, molarMass } from './molar-mass';
import { expectWithin } from './testing/expect-within';

describe('molarMass', () => {
  // IUPAC/CIAAW 2021 conventional atomic weights (H 1.008, C 12.011, N 14.007, O 15.999,
  // S 32.06, Cl 35.45; published-values.md) and abridged Cu 63.546, Ca 40.078 (ciaaw.org 2021).
  // Expected values are the sums, shown to the weights' last decimal; e.g. CuSO4·5H2O:
  // 63.546 + 32.06 + 4 × 15.999 + 5 × (2 × 1.008 + 15.999) = 249.677 ≈ 249.68.
  const table: Array<[string, number, number]> = [
    ['H2O', 18.015, 0.0005],
    ['CO2', 44.009, 0.0005],
    ['CH4', 16.043, 0.0005],
    ['NH3', 17.031, 0.0005],
    ['C2H5OH', 46.069, 0.0005],
    ['CH3OH', 32.042, 0.0005],
    ['Ca(OH)2', 74.092, 0.0005],
    ['CuSO4·5H2O', 249.68, 0.005],
    ['CuSO4.5H2O', 249.677, 0.0005],
    ['HCl', 36.458, 0.0005],
    ['SO4^2-', 96.056, 0.0005],
  ];
  for (const [formula, expected, tolerance] of table) {
    it(`${formula}: ${expected} g/mol`, () => {
      expectWithin(molarMass(parseFormula(formula)), expected, tolerance, formula);
    });
  }

  it('neglects the electron mass of ions by default and subtracts z·M(e) when asked', () => {
    // Common practice: the electron mass is below the uncertainty of the conventional weights.
    const ammonium = parseFormula('NH4+');
    expectWithin(molarMass(ammonium), 18.039, 0.0005, 'NH4+');
    expectWithin(molarMass(ammonium, { includeElectronMass: true }), 18.039 - ELECTRON_MOLAR_MASS, 1e-12, 'NH4+ with e');
  });

  it('gives the electron its own molar mass (CODATA 2018, 5.4858e-4 g/mol, from memory)', () => {
    expectWithin(molarMass(parseFormula('e-')), 5.4858e-4, 1e-8, 'e-');
  });
});
