import { FormulaError } from './errors';
import { formatPhase, parsePhaseLabel, samePhase } from './phase';

describe('phase labels', () => {
  // IUPAC Green Book (Quantities, Units and Symbols in Physical Chemistry, 3rd ed., 2007),
  // states of aggregation: g, l, cr, am, aq, s, vit, sln, lc; "aq, ∞" for infinite dilution.
  const good: Array<[string, string]> = [
    ['g', '(g)'], ['l', '(l)'], ['cr', '(cr)'], ['am', '(am)'], ['aq', '(aq)'], ['s', '(s)'], ['vit', '(vit)'],
    ['cr, graphite', '(cr, graphite)'], ['cr,graphite', '(cr, graphite)'], [' cr , rhombic ', '(cr, rhombic)'],
    ['cr, I', '(cr, I)'], ['aq, ∞', '(aq, ∞)'], ['aq,inf', '(aq, ∞)'], ['aq, infinite dilution', '(aq, ∞)'],
  ];
  for (const [label, formatted] of good) {
    it(`reads "${label}" as ${formatted}`, () => {
      expect(formatPhase(parsePhaseLabel(label))).toBe(formatted);
    });
  }

  const bad: Array<[string, number, RegExp]> = [
    ['gas', 0, /unknown phase 'gas'/],
    ['ao', 0, /NBS-table label/],
    ['aq, 1 molal', 4, /'aq' takes only '∞'/],
    ['g, high', 3, /'g' takes no modification/],
    ['cr,', 3, /empty detail/],
    ['cr, (alpha)', 4, /must be a name/],
  ];
  for (const [label, column, reason] of bad) {
    it(`rejects "${label}" at column ${column}`, () => {
      expect(() => parsePhaseLabel(label)).toThrowMatching(
        (e) => e instanceof FormulaError && e.column === column && reason.test(e.reason),
      );
    });
  }

  it('compares phases by state and modification', () => {
    expect(samePhase(parsePhaseLabel('cr,graphite'), parsePhaseLabel('cr, graphite'))).toBeTrue();
    expect(samePhase(parsePhaseLabel('cr, graphite'), parsePhaseLabel('cr'))).toBeFalse();
    expect(samePhase(parsePhaseLabel('aq'), parsePhaseLabel('aq, ∞'))).toBeFalse();
    expect(samePhase(null, null)).toBeTrue();
  });
});
