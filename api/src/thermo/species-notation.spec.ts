import { FormulaError } from './errors';
import { parseSpecies } from './species-notation';

describe('parseSpecies', () => {
  // IUPAC Green Book phase abbreviations after the formula (common practice of the tables:
  // "C(cr, graphite)", "H2O(l)").
  const table: Array<[string, string, Record<string, number>, number]> = [
    ['H2O(l)', 'H2O(l)', { H: 2, O: 1 }, 0],
    ['H2O (g)', 'H2O(g)', { H: 2, O: 1 }, 0],
    ['C(cr,graphite)', 'C(cr, graphite)', { C: 1 }, 0],
    ['S(cr, rhombic)', 'S(cr, rhombic)', { S: 1 }, 0],
    ['SO4^2-(aq)', 'SO4^2-(aq)', { S: 1, O: 4 }, -2],
    ['H+(aq,inf)', 'H+(aq, ∞)', { H: 1 }, 1],
    ['Ca(OH)2(cr)', 'Ca(OH)2(cr)', { Ca: 1, O: 2, H: 2 }, 0],
    ['Ca(OH)2', 'Ca(OH)2', { Ca: 1, O: 2, H: 2 }, 0],
    ['SO4(2-)', 'SO4(2-)', { S: 1, O: 4 }, -2],
    ['e-(g)', 'e-(g)', {}, -1],
  ];
  for (const [text, label, elements, charge] of table) {
    it(`reads ${text} as ${label}`, () => {
      const s = parseSpecies(text);
      expect(s.label).toBe(label);
      expect(s.formula.elements).toEqual(elements);
      expect(s.formula.charge).toBe(charge);
    });
  }

  it('keeps no phase when none is written', () => {
    expect(parseSpecies('CH4').phase).toBeNull();
  });

  it('reports errors at the column of the whole text, with an offset inside an equation', () => {
    expect(() => parseSpecies('H2Xx(g)')).toThrowMatching((e) => e instanceof FormulaError && e.column === 2);
    expect(() => parseSpecies('H2O(gas)', 10, 'x'.repeat(10) + 'H2O(gas)')).toThrowMatching(
      (e) => e instanceof FormulaError && e.column === 14 && /unknown phase 'gas'/.test(e.reason),
    );
    expect(() => parseSpecies('(g)')).toThrowMatching((e) => e instanceof FormulaError && /needs a formula/.test(e.reason));
  });
});
