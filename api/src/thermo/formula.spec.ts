import fc from 'fast-check';
import { FormulaError } from './errors';
import { parseFormula, tryParseFormula } from './formula';
import { expectProperty } from './testing/expect-property';

describe('parseFormula', () => {
  // Element counts follow from the formulas as written (common practice of chemical notation).
  const table: Array<[string, Record<string, number>, number]> = [
    ['CH3OH', { C: 1, H: 4, O: 1 }, 0],
    ['C2H5OH', { C: 2, H: 6, O: 1 }, 0],
    ['Ca(OH)2', { Ca: 1, O: 2, H: 2 }, 0],
    ['CuSO4·5H2O', { Cu: 1, S: 1, O: 9, H: 10 }, 0],
    ['CuSO4.5H2O', { Cu: 1, S: 1, O: 9, H: 10 }, 0],
    ['CuSO4*5H2O', { Cu: 1, S: 1, O: 9, H: 10 }, 0],
    ['CuSO4 · 5H2O', { Cu: 1, S: 1, O: 9, H: 10 }, 0],
    ['CaSO4·0.5H2O', { Ca: 1, S: 1, O: 4.5, H: 1 }, 0],
    ['K4[Fe(CN)6]', { K: 4, Fe: 1, C: 6, N: 6 }, 0],
    ['[Fe(CN)6]4-', { Fe: 1, C: 6, N: 6 }, -4],
    ['[Cu(H2O)6]2+', { Cu: 1, H: 12, O: 6 }, 2],
    ['NH4+', { N: 1, H: 4 }, 1],
    ['SO4-2', { S: 1, O: 4 }, -2],
    ['SO4^2-', { S: 1, O: 4 }, -2],
    ['SO4^-2', { S: 1, O: 4 }, -2],
    ['SO4--', { S: 1, O: 4 }, -2],
    ['SO4²⁻', { S: 1, O: 4 }, -2],
    ['SO4(2-)', { S: 1, O: 4 }, -2],
    ['Fe+3', { Fe: 1 }, 3],
    ['Fe^3+', { Fe: 1 }, 3],
    ['Fe+++', { Fe: 1 }, 3],
    ['Fe³⁺', { Fe: 1 }, 3],
    ['OH−', { O: 1, H: 1 }, -1],
    ['H₂O', { H: 2, O: 1 }, 0],
    ['D2O', { D: 2, O: 1 }, 0],
    ['Fe0.947O', { Fe: 0.947, O: 1 }, 0],
    ['Co', { Co: 1 }, 0],
    ['CO', { C: 1, O: 1 }, 0],
    ['  N2  ', { N: 2 }, 0],
    ['Mg3(PO4)2', { Mg: 3, P: 2, O: 8 }, 0],
    ['Al2(SO4)3·18H2O', { Al: 2, S: 3, O: 30, H: 36 }, 0],
  ];
  for (const [text, elements, charge] of table) {
    it(`reads ${JSON.stringify(text)}`, () => {
      const f = parseFormula(text);
      expect(f.elements).toEqual(elements);
      expect(f.charge).toBe(charge);
      expect(f.isElectron).toBeFalse();
    });
  }

  it('reads the electron e- (also e−, e⁻)', () => {
    for (const text of ['e-', 'e−', 'e⁻', 'e^-']) {
      const f = parseFormula(text);
      expect(f).withContext(text).toEqual(jasmine.objectContaining({ elements: {}, charge: -1, isElectron: true }));
    }
  });

  describe('bad input: an error that says where and why', () => {
    const bad: Array<[string, number, RegExp]> = [
      ['', 0, /empty formula/],
      ['   ', 3, /empty formula/],
      ['CXx', 1, /unknown element 'Xx'/],
      ['Uue', 0, /unknown element 'Uue'/],
      ['co', 0, /unknown element 'co' \(element symbols start with a capital letter\)/],
      ['h2o', 0, /unknown element 'h'/],
      ['Ca(OH2', 2, /unbalanced '\('/],
      ['CaOH)2', 4, /unbalanced '\)'/],
      ['Ca(OH]2', 2, /'\(' is closed by '\]' at column 5/],
      ['Ca()2', 2, /empty '\(\)'/],
      ['2H2O', 0, /cannot start with a number/],
      ['H0', 1, /count of zero/],
      ['H2O(g)', 3, /phase label '\(g\)' is not part of a formula/],
      ['H2 O', 2, /unexpected space/],
      ['CuSO4·', 6, /expected a formula after the hydrate separator/],
      ['CuSO4·5', 7, /expected a formula after the hydrate separator/],
      ['SO4+-', 4, /mixed '\+' and '-'/],
      ['SO4-0', 3, /charge of zero/],
      ['SO4^2', 5, /expected '\+' or '-'/],
      ['NH4+x', 4, /unexpected 'x' after the charge/],
      ['e', 0, /unknown element 'e'/],
      ['e-2', 0, /electron has charge −1/],
      ['H2O!', 3, /unexpected '!'/],
      ['((((((((((((((((((((((((((((((((((H))))))))))))))))))))))))))))))))))', 33, /nested deeper than 32/],
    ];
    for (const [text, column, reason] of bad) {
      it(`${JSON.stringify(text)} → column ${column}, ${reason.source}`, () => {
        const result = tryParseFormula(text);
        expect(result.ok).toBeFalse();
        if (result.ok) return;
        expect(result.error).toBeInstanceOf(FormulaError);
        expect(result.error.column).toBe(column);
        expect(result.error.reason).toMatch(reason);
        expect(result.error.message).toContain(`at column ${column}`);
      });
    }

    it('never throws anything but a FormulaError, and never yields NaN (property)', () => {
      expectProperty(
        fc.property(fc.string({ unit: fc.constantFrom(...'CHONSaluFe()[]·.*+-^2345 0e²⁻₂'.split('')), maxLength: 16 }), (text) => {
          const result = tryParseFormula(text);
          if (!result.ok) return result.error instanceof FormulaError && result.error.column >= 0 && result.error.column <= text.length;
          return Object.values(result.formula.elements).every((n) => Number.isFinite(n) && n > 0) && Number.isInteger(result.formula.charge);
        }),
        { numRuns: 2000 },
      );
    });
  });
});
