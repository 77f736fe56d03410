import fc from 'fast-check';
import { parseFormula } from './formula';
import { formatCharge, hillFormula, hillOrder } from './formula-format';
import { expectProperty } from './testing/expect-property';

describe('Hill formula', () => {
  // Hill system (E. A. Hill, J. Am. Chem. Soc. 22, 478, 1900): C first, then H, then the rest
  // alphabetically; without carbon everything alphabetically.
  const table: Array<[string, string]> = [
    ['CH3OH', 'CH4O'],
    ['C2H5OH', 'C2H6O'],
    ['Ca(OH)2', 'CaH2O2'],
    ['CuSO4·5H2O', 'CuH10O9S'],
    ['H2SO4', 'H2O4S'],
    ['NaCl', 'ClNa'],
    ['CCl4', 'CCl4'],
    ['CHCl3', 'CHCl3'],
    ['K4[Fe(CN)6]', 'C6FeK4N6'],
    ['NH4+', 'H4N+'],
    ['SO4^2-', 'O4S-2'],
    ['Fe^3+', 'Fe+3'],
    ['e-', 'e-'],
  ];
  for (const [text, hill] of table) {
    it(`${text} → ${hill}`, () => {
      expect(hillFormula(parseFormula(text))).toBe(hill);
    });
  }

  it('orders symbols: C, H, then alphabetical; without C all alphabetical', () => {
    expect(hillOrder(['O', 'H', 'C', 'N'])).toEqual(['C', 'H', 'N', 'O']);
    expect(hillOrder(['O', 'H', 'N'])).toEqual(['H', 'N', 'O']);
    expect(hillOrder(['Cl', 'C', 'D'])).toEqual(['C', 'Cl', 'D']);
  });

  it('formats charges so that the parser reads them back', () => {
    expect([formatCharge(0), formatCharge(1), formatCharge(-1), formatCharge(2), formatCharge(-3)]).toEqual(['', '+', '-', '+2', '-3']);
  });

  it('round-trips: parse(hill(f)) has the counts and charge of f (property)', () => {
    const symbols = ['C', 'H', 'O', 'N', 'S', 'Cl', 'Fe', 'Na', 'Ca', 'Cu'];
    expectProperty(
      fc.property(
        fc.dictionary(fc.constantFrom(...symbols), fc.integer({ min: 1, max: 40 }), { minKeys: 1 }),
        fc.integer({ min: -4, max: 4 }),
        (elements, charge) => {
          const text = Object.entries(elements).map(([s, n]) => s + (n === 1 ? '' : n)).join('') + formatCharge(charge);
          const f = parseFormula(text);
          const again = parseFormula(hillFormula(f));
          expect(again.elements).toEqual(f.elements);
          expect(again.charge).toBe(charge);
        },
      ),
      { numRuns: 500 },
    );
  });
});
