import fc from 'fast-check';
import { ReactionError } from './errors';
import { Rational } from './rational';
import { checkBalance, normaliseEquation, parseReaction, stoichiometricNumbers, tryParseReaction } from './reaction';
import { expectProperty } from './testing/expect-property';

describe('parseReaction', () => {
  // Equations as written in the NBS 1982 and CODATA 1989 reaction checks and in textbooks
  // (common practice of chemical notation).
  const normalised: Array<[string, string]> = [
    ['CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)', 'CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)'],
    ['CH4(g)+2O2(g)→CO2(g)+2H2O(l)', 'CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)'],
    ['  CO(g)  +  1/2 O2(g) =  CO2(g) ', 'CO(g) + 1/2 O2(g) -> CO2(g)'],
    ['CO + 0.5 O2 => CO2', 'CO + 1/2 O2 -> CO2'],
    ['CO + ½O2 ⇌ CO2', 'CO + 1/2 O2 <=> CO2'],
    ['N2(g) + 3 H2(g) <=> 2 NH3(g)', 'N2(g) + 3 H2(g) <=> 2 NH3(g)'],
    ['N2 + 3H2 <-> 2NH3', 'N2 + 3 H2 <=> 2 NH3'],
    ['C(cr,graphite) + O2(g) ⟶ CO2(g)', 'C(cr, graphite) + O2(g) -> CO2(g)'],
    ['1 H2 + 1 Cl2 -> 2 HCl', 'H2 + Cl2 -> 2 HCl'],
    ['NH4+ + OH- -> NH3 + H2O', 'NH4+ + OH- -> NH3 + H2O'],
    ['NH4++OH-->NH3+H2O', 'NH4+ + OH- -> NH3 + H2O'],
    ['Fe+3 + e- -> Fe+2', 'Fe+3 + e- -> Fe+2'],
    ['Fe+3(aq) + e- -> Fe+2(aq)', 'Fe+3(aq) + e- -> Fe+2(aq)'],
    ['H2+O2->H2O2', 'H2 + O2 -> H2O2'],
    ['2 H+(aq) + SO4^2-(aq) -> H2SO4(l)', '2 H+(aq) + SO4^2-(aq) -> H2SO4(l)'],
    ['CuSO4·5H2O(cr) -> CuSO4(cr) + 5 H2O(g)', 'CuSO4·5H2O(cr) -> CuSO4(cr) + 5 H2O(g)'],
  ];
  for (const [text, expected] of normalised) {
    it(`normalises ${JSON.stringify(text)}`, () => {
      expect(normaliseEquation(parseReaction(text))).toBe(expected);
    });
  }

  it('keeps coefficients exact and records which were not written', () => {
    const r = parseReaction('CO + 1/2 O2 -> CO2');
    expect(r.reactants[0].coefficient).toBeNull();
    expect(r.reactants[1].coefficient?.equals(Rational.of(1, 2))).toBeTrue();
    expect(r.arrow).toBe('forward');
    expect(r.reactants[1].column).toBe(5);
  });

  it('gives signed stoichiometric numbers, merging a species on both sides', () => {
    const nu = stoichiometricNumbers(parseReaction('CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)'));
    expect(nu.map((e) => [e.label, e.nu])).toEqual([['CH4(g)', -1], ['O2(g)', -2], ['CO2(g)', 1], ['H2O(l)', 2]]);
    const catalysed = stoichiometricNumbers(parseReaction('2 H2O2 + I- -> 2 H2O + O2 + I-'));
    expect(catalysed.find((e) => e.label === 'I-')?.nu).toBe(0);
  });

  describe('balance check', () => {
    it('passes a balanced equation (NBS methane combustion as written)', () => {
      const check = checkBalance(parseReaction('CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)'));
      expect(check.balanced).toBeTrue();
      expect(check.message).toBe('elements and charge balance');
    });

    it('names each element and the charge that do not balance', () => {
      const check = checkBalance(parseReaction('CH4 + O2 -> CO2 + H2O'));
      expect(check.balanced).toBeFalse();
      expect(check.message).toBe('unbalanced: H: 4 on the left, 2 on the right; O: 2 on the left, 3 on the right');
      expect(check.elementExcess['H'].toString()).toBe('2');
      const charge = checkBalance(parseReaction('Fe+3 -> Fe+2'));
      expect(charge.message).toBe('unbalanced: charge: 3 on the left, 2 on the right');
    });

    it('balances charge with electrons (Fe3+ + e- -> Fe2+)', () => {
      expect(checkBalance(parseReaction('Fe+3 + e- -> Fe+2')).balanced).toBeTrue();
    });

    it('counts fractional coefficients exactly (CO + 1/2 O2 -> CO2)', () => {
      expect(checkBalance(parseReaction('CO + 1/2 O2 -> CO2')).balanced).toBeTrue();
      expect(checkBalance(parseReaction('CO + 0.4 O2 -> CO2')).message).toBe('unbalanced: O: 9/5 on the left, 2 on the right');
    });
  });

  describe('bad input: an error that says where and why', () => {
    const bad: Array<[string, number | null, RegExp]> = [
      ['CH4 + O2', null, /no arrow/],
      ['CH4 -> CO2 -> CO', 11, /more than one arrow/],
      ['-> CO2', 0, /no reactants/],
      ['CH4 ->', 6, /no products/],
      ['CH4 + -> CO2', 6, /missing species before '\+'/],
      ['CH4 -> CO2 +', 12, /missing species after '\+'/],
      ['CH4 + Xx2 -> CO2', 6, /unknown element 'Xx'/],
      ['Ca(OH2 -> CaO + H2O', 2, /unbalanced '\('/],
      ['0 H2 + O2 -> H2O2', 0, /coefficient of zero/],
      ['1/0 H2 -> H2', 0, /not a valid coefficient/],
      ['2 -> H2', 0, /coefficient without a species/],
      ['H2O(gas) -> H2O(l)', 4, /unknown phase 'gas'/],
      ['2 h2o -> 2 H2 + O2', 2, /unknown element 'h'/],
      ['H2 + O2 -> 2H2O(g', 15, /unbalanced '\('/],
    ];
    it('never throws anything but a ReactionError, with a column inside the text (property)', () => {
      const unit = fc.constantFrom(...'CHON2345()+-> =/.½e^'.split(''), ' + ', ' -> ', '(g)', '(aq)', 'O2', 'H2O', 'Fe+3');
      expectProperty(
        fc.property(fc.array(unit, { maxLength: 12 }).map((parts) => parts.join('')), (text) => {
          const result = tryParseReaction(text);
          if (result.ok) return result.reaction.reactants.length > 0 && result.reaction.products.length > 0;
          return result.error instanceof ReactionError &&
            (result.error.column === null || (result.error.column >= 0 && result.error.column <= text.length));
        }),
        { numRuns: 2000 },
      );
    });

    for (const [text, column, reason] of bad) {
      it(`${JSON.stringify(text)} → ${reason.source}`, () => {
        const result = tryParseReaction(text);
        expect(result.ok).toBeFalse();
        if (result.ok) return;
        expect(result.error).toBeInstanceOf(ReactionError);
        expect(result.error.column).toBe(column);
        expect(result.error.reason).toMatch(reason);
      });
    }
  });
});
