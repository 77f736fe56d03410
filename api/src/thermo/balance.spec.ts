import fc from 'fast-check';
import { balanceReaction } from './balance';
import { parseFormula } from './formula';
import { checkBalance, parseReaction, type ParsedReaction } from './reaction';
import { expectProperty } from './testing/expect-property';

function balance(text: string) {
  return balanceReaction(parseReaction(text));
}

describe('balanceReaction', () => {
  // Balanced forms of textbook equations (common practice; each is checked by element count
  // in the last spec of this file and by the property below).
  const table: Array<[string, string]> = [
    ['CH4 + O2 -> CO2 + H2O', 'CH4 + 2 O2 -> CO2 + 2 H2O'],
    ['H2 + O2 -> H2O', '2 H2 + O2 -> 2 H2O'],
    ['N2 + H2 -> NH3', 'N2 + 3 H2 -> 2 NH3'],
    ['C2H5OH(l) + O2(g) -> CO2(g) + H2O(l)', 'C2H5OH(l) + 3 O2(g) -> 2 CO2(g) + 3 H2O(l)'],
    ['C2H6 + O2 -> CO2 + H2O', '2 C2H6 + 7 O2 -> 4 CO2 + 6 H2O'],
    ['KMnO4 + HCl = KCl + MnCl2 + H2O + Cl2', '2 KMnO4 + 16 HCl -> 2 KCl + 2 MnCl2 + 8 H2O + 5 Cl2'],
    ['MnO4- + Fe+2 + H+ -> Mn+2 + Fe+3 + H2O', 'MnO4- + 5 Fe+2 + 8 H+ -> Mn+2 + 5 Fe+3 + 4 H2O'],
    ['Cr2O7^2- + Fe+2 + H+ -> Cr+3 + Fe+3 + H2O', 'Cr2O7^2- + 6 Fe+2 + 14 H+ -> 2 Cr+3 + 6 Fe+3 + 7 H2O'],
    ['CuSO4·5H2O -> CuSO4 + H2O', 'CuSO4·5H2O -> CuSO4 + 5 H2O'],
    ['Fe0.947O + O2 -> Fe2O3', '4000 Fe0.947O + 841 O2 -> 1894 Fe2O3'],
  ];
  for (const [text, expected] of table) {
    it(`${text} ⇒ ${expected}`, () => {
      const result = balance(text);
      expect(result.status).toBe('balanced');
      if (result.status !== 'balanced') return;
      expect(result.equation).toBe(expected);
      expect(checkBalance(result.reaction).balanced).toBeTrue();
    });
  }

  it('keeps the coefficients given and solves for the rest exactly (CO + 1/2 O2 -> CO2)', () => {
    const result = balance('CO + 1/2 O2 -> CO2');
    expect(result.status).toBe('balanced');
    if (result.status === 'balanced') expect(result.equation).toBe('CO + 1/2 O2 -> CO2');
    const partial = balance('2 CO + O2 -> CO2');
    expect(partial.status).toBe('balanced');
    if (partial.status === 'balanced') expect(partial.equation).toBe('2 CO + O2 -> 2 CO2');
    const fractional = balance('CO + O2 -> 1 CO2');
    if (fractional.status === 'balanced') expect(fractional.coefficients.map((c) => c.toString())).toEqual(['1', '1/2', '1']);
    expect(fractional.status).toBe('balanced');
  });

  it('returns an equation that balances as written unchanged, even when other balances exist', () => {
    // 10 species, 4 elements: many balances; the written one (with implicit 1s) is kept
    const text = 'CH4 + 5/2 O2 + N2 + H + O -> CO2 + H2O + 2 NO + H2 + OH';
    const result = balance(text);
    expect(result.status).toBe('balanced');
    if (result.status === 'balanced') expect(result.equation).toBe(text);
  });

  it('says "not unique" when independent reactions are mixed, with the number of free choices', () => {
    const result = balance('H2 + O2 -> H2O + H2O2');
    expect(result.status).toBe('not-unique');
    if (result.status !== 'not-unique') return;
    expect(result.degreesOfFreedom).toBe(2);
    expect(result.reason).toMatch(/not unique: 2 independent combinations/);
    const partial = balance('CO + 2 O2 -> CO2 + O3 + O');
    expect(partial.status).toBe('not-unique');
  });

  const impossible: Array<[string, RegExp]> = [
    ['H2 -> O2', /element on one side only: H \(left only\), O \(right only\)/],
    ['NaCl -> Na + Cl2 + H2O', /element on one side only: H \(right only\)/],
    ['CO + H2O -> CO2 + H2 + O3 + C', /not unique|no balance/],
    ['CO2 + H2O -> CO + H2O2 + O2 + C', /not unique|no balance/],
    ['H2O -> H2 + O2 + H2O2 + O3', /not unique/],
    ['2 H2 + 2 O2 -> H2O', /imbalance that the species without coefficients cannot make up|no balance/],
    ['2 H2 + 1 O2 -> 3 H2O', /every coefficient is given and the equation does not balance/],
    ['CO2 + O2 -> CO', /would need a negative coefficient/],
    ['Fe+3 -> Fe+2', /only the all-zero solution/],
  ];
  for (const [text, reason] of impossible) {
    it(`${text} cannot be balanced: ${reason.source}`, () => {
      const result = balance(text);
      expect(result.status).not.toBe('balanced');
      if (result.status !== 'balanced') expect(result.reason).toMatch(reason);
    });
  }

  it('every "balanced" result really balances, with positive coefficients (property)', () => {
    // Generated equations: a random split of real species into two sides.
    const pool = ['CH4', 'O2', 'CO2', 'H2O', 'CO', 'H2', 'N2', 'NH3', 'NO', 'NO2', 'C2H6', 'C2H5OH', 'Fe', 'Fe2O3',
      'Fe3O4', 'Al', 'Al2O3', 'KClO3', 'KCl', 'HCl', 'Cl2', 'NaOH', 'NaCl', 'H2SO4', 'SO2', 'SO3', 'H+', 'OH-', 'e-',
      'Fe+2', 'Fe+3', 'MnO4-', 'Mn+2', 'C3H8', 'C6H12O6', 'CaCO3', 'CaO', 'H2O2', 'O3'];
    expectProperty(
      fc.property(
        fc.uniqueArray(fc.constantFrom(...pool), { minLength: 2, maxLength: 7 }),
        fc.integer({ min: 1, max: 6 }),
        (species, cut) => {
          const split = Math.min(Math.max(1, cut), species.length - 1);
          const text = `${species.slice(0, split).join(' + ')} -> ${species.slice(split).join(' + ')}`;
          const result = balance(text);
          if (result.status !== 'balanced') return result.reason.length > 10;
          const reaction: ParsedReaction = result.reaction;
          return checkBalance(reaction).balanced && result.coefficients.every((c) => c.sign() > 0 && c.isInteger());
        },
      ),
      { numRuns: 1000 },
    );
  });

  it('checks the table by counting atoms independently of the balancer', () => {
    // 2 KMnO4 + 16 HCl -> 2 KCl + 2 MnCl2 + 8 H2O + 5 Cl2, counted atom by atom
    const side = (terms: Array<[number, string]>) => {
      const total: Record<string, number> = {};
      for (const [n, f] of terms) for (const [s, c] of Object.entries(parseFormula(f).elements)) total[s] = (total[s] ?? 0) + n * c;
      return total;
    };
    expect(side([[2, 'KMnO4'], [16, 'HCl']])).toEqual(side([[2, 'KCl'], [2, 'MnCl2'], [8, 'H2O'], [5, 'Cl2']]));
    // 4000 Fe0.947O + 841 O2 -> 1894 Fe2O3: Fe 3788 = 3788, O 4000 + 1682 = 5682
    expect(side([[4000, 'Fe0.947O'], [841, 'O2']])).toEqual(side([[1894, 'Fe2O3']]));
  });
});
