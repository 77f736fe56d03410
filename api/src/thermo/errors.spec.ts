import { FormulaError, OutOfRangeError, ReactionError, ThermoError, ThermoInputError } from './errors';

describe('engine errors', () => {
  // Conventions of the API (conventions.md): typed errors with a message a person can act on.
  it('say where and why, and carry a code for the HTTP layer', () => {
    const formula = new FormulaError('CXx', 1, "unknown element 'Xx'");
    expect(formula.message).toBe("unknown element 'Xx' at column 1");
    expect(formula.code).toBe('formula');
    expect(formula).toBeInstanceOf(ThermoError);
    const reaction = new ReactionError('H2 + O2 -> H2O + H2O2', null, 'the balance is not unique');
    expect(reaction.message).toBe('the balance is not unique');
    const range = new OutOfRangeError(150, 200, 6000, 'N2(g)');
    expect(range.message).toMatch(/^T = 150 K is outside the valid range 200–6000 K of the N2\(g\)/);
    expect(new ThermoInputError('mass', 'must be positive').message).toBe('mass: must be positive');
    expect([formula.name, reaction.name, range.name]).toEqual(['FormulaError', 'ReactionError', 'OutOfRangeError']);
  });
});
