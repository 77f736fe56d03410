import { PhaseDescription, describePhase } from './phase';

describe('describePhase', () => {
  const cases: ReadonlyArray<readonly [string, string | null, PhaseDescription]> = [
    ['g', null, { abbreviation: 'g', label: 'gas', family: 'gas' }],
    ['l', null, { abbreviation: 'l', label: 'liquid', family: 'liquid' }],
    ['cr', null, { abbreviation: 'cr', label: 'crystalline solid', family: 'solid' }],
    ['cr', 'graphite', { abbreviation: 'cr, graphite', label: 'crystalline solid, graphite', family: 'solid' }],
    ['cr,II', null, { abbreviation: 'cr, II', label: 'crystalline solid, II', family: 'solid' }],
    ['am', null, { abbreviation: 'am', label: 'amorphous solid', family: 'solid' }],
    ['aq', null, { abbreviation: 'aq', label: 'aqueous solution', family: 'solution' }],
    ['aq, ∞', null, { abbreviation: 'aq, ∞', label: 'aqueous solution at infinite dilution', family: 'solution' }],
    ['aq,inf', null, { abbreviation: 'aq, ∞', label: 'aqueous solution at infinite dilution', family: 'solution' }],
    ['xyz', null, { abbreviation: 'xyz', label: 'phase xyz', family: 'other' }],
  ];

  for (const [phase, polymorph, expected] of cases) {
    it(`describes ${phase}${polymorph ? ` (${polymorph})` : ''} as ${expected.label}`, () => {
      expect(describePhase(phase, polymorph)).toEqual(expected);
    });
  }
});
